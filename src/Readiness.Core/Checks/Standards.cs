using Readiness.Core.Reports;

namespace Readiness.Core.Checks;

/// <summary>The published standards checks cite (standards.md), one instance each.</summary>
public static class Standards
{
    public static readonly StandardReference MsBuildProjectFiles = new("MSBuild project file schema (XML 1.0)", "https://learn.microsoft.com/visualstudio/msbuild/msbuild-project-file-schema-reference");
    public static readonly StandardReference SemVer = new("Semantic Versioning 2.0.0", "https://semver.org/spec/v2.0.0.html");
    public static readonly StandardReference NuGetVersioning = new("NuGet package versioning", "https://learn.microsoft.com/nuget/concepts/package-versioning");
    public static readonly StandardReference KeepAChangelog = new("Keep a Changelog 1.1.0", "https://keepachangelog.com/en/1.1.0/");
    public static readonly StandardReference Spdx = new("SPDX license expressions (SPDX 3.0.1 annex)", "https://spdx.github.io/spdx-spec/v3.0.1/annexes/spdx-license-expressions/");
    public static readonly StandardReference NuGetLicense = new("NuGet nuspec license metadata", "https://learn.microsoft.com/nuget/reference/nuspec#license");
    public static readonly StandardReference SpdxMatching = new("SPDX license matching guidelines", "https://spdx.github.io/spdx-spec/v2.3/license-matching-guidelines-and-templates/");
    public static readonly StandardReference NuGetAssets = new("NuGet PackageReference asset control", "https://learn.microsoft.com/nuget/consume-packages/package-references-in-project-files#controlling-dependency-assets");
    public static readonly StandardReference NuGetDependencies = new("NuGet dependency versions", "https://learn.microsoft.com/nuget/concepts/dependency-resolution");
    public static readonly StandardReference NuGetPack = new("NuGet pack and restore as MSBuild targets", "https://learn.microsoft.com/nuget/reference/msbuild-targets");
    public static readonly StandardReference DotNetLifecycle = new(".NET releases and support", "https://github.com/dotnet/core/blob/main/releases.md");
    public static readonly StandardReference LibraryTargeting = new(".NET library guidance: cross-platform targeting", "https://learn.microsoft.com/dotnet/standard/library-guidance/cross-platform-targeting");
    public static readonly StandardReference GitSignature = new("git signature format", "https://git-scm.com/docs/gitformat-signature");
    public static readonly StandardReference NuGetMetadata = new("NuGet nuspec metadata", "https://learn.microsoft.com/nuget/reference/nuspec");
    public static readonly StandardReference SourceLink = new("Source Link and deterministic builds", "https://github.com/dotnet/sourcelink");
    public static readonly StandardReference NuGetConfig = new("nuget.config reference (credentials)", "https://learn.microsoft.com/nuget/reference/nuget-config-file#packagesourcecredentials");
    public static readonly StandardReference NuGetPublish = new("NuGet package publish resource", "https://learn.microsoft.com/nuget/api/package-publish-resource");
    public static readonly StandardReference NuGetPrefix = new("NuGet package ID prefix reservation", "https://learn.microsoft.com/nuget/nuget-org/id-prefix-reservation");
}
