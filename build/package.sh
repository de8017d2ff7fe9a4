#!/usr/bin/env bash
# Builds what Readiness ships, into artifacts/ (or $ARTIFACTS):
#   artifacts/<rid>/readiness                 self-contained, ahead-of-time compiled executable (the fast one)
#   artifacts/tool/Readiness.Cli.<v>.nupkg    framework-dependent .NET tool package (`dotnet tool install`)
# Usage: build/package.sh [RID ...]   (default: linux-x64; Native AOT builds for the machine's own OS)
set -euo pipefail
cd "$(dirname "$0")/.."
out="${ARTIFACTS:-artifacts}"
export DOTNET_CLI_TELEMETRY_OPTOUT=1 DOTNET_NOLOGO=1
[ $# -gt 0 ] || set -- linux-x64
for rid in "$@"; do
  rm -rf "${out:?}/$rid"
  # The project's publish properties make this the Native AOT build (see src/Readiness.Cli/Readiness.Cli.csproj).
  dotnet publish src/Readiness.Cli/Readiness.Cli.csproj -c Release -r "$rid" -o "$out/$rid"
  echo "executable: $out/$rid/readiness"
done
rm -rf "${out:?}/tool"
dotnet pack src/Readiness.Cli/Readiness.Cli.csproj -c Release -o "$out/tool"
echo "tool package: $(ls "$out"/tool/Readiness.Cli.*.nupkg | grep -v snupkg)"
