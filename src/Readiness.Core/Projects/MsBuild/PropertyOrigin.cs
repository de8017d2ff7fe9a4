namespace Readiness.Core.Projects.MsBuild;

/// <summary>Who set a property during evaluation.</summary>
internal enum PropertyOrigin
{
    /// <summary>A file of the repository.</summary>
    File,

    /// <summary>MSBuild's reserved properties (MSBuildProjectDirectory and the like); read-only.</summary>
    Reserved,

    /// <summary>A global property (TargetFramework of an inner build); files cannot change it.</summary>
    Global,

    /// <summary>A default the .NET SDK computes at a known point of evaluation, modelled here.</summary>
    Sdk,
}
