#!/usr/bin/env bash
# Start-up of each publish mode against its floor (the bench's `startup` case), one run per mode:
#   jit  framework-dependent (what the .NET tool package runs)
#   r2r  self-contained ReadyToRun, composite
#   aot  Native AOT (what `dotnet publish` of the CLI and build/package.sh ship)
# Usage: build/bench.sh [RUNS] [MODE ...]     e.g. build/bench.sh 21 jit aot
set -euo pipefail
cd "$(dirname "$0")/.."
export DOTNET_CLI_TELEMETRY_OPTOUT=1 DOTNET_NOLOGO=1
runs="${1:-21}"; shift || true
[ $# -gt 0 ] || set -- jit r2r aot
work="${BENCH_OUT:-artifacts/bench}"
rid=linux-x64
publish() { # MODE PROJECT NAME
  local mode="$1" project="$2" name="$3" dir="$work/$1/$3"
  case "$mode" in
    jit) dotnet publish "$project" -c Release -o "$dir" -p:PublishAot=false >/dev/null ;;
    r2r) dotnet publish "$project" -c Release -r "$rid" --self-contained -o "$dir" -p:PublishAot=false \
           -p:PublishReadyToRun=true -p:PublishReadyToRunComposite=true >/dev/null ;;
    aot) dotnet publish "$project" -c Release -r "$rid" -o "$dir" -p:PublishAot=true >/dev/null ;;
  esac
}
dotnet build tests/Readiness.Bench -c Release >/dev/null
for mode in "$@"; do
  publish "$mode" src/Readiness.Cli/Readiness.Cli.csproj readiness
  publish "$mode" tests/Readiness.Bench.Hello/Readiness.Bench.Hello.csproj hello
done
for mode in "$@"; do
  dotnet run --project tests/Readiness.Bench -c Release --no-build -- startup \
    --program "$work/$mode/readiness/readiness" --hello "$work/$mode/hello/hello" --runs "$runs" --label "$mode"
done
