using NuGet.Frameworks;

namespace Readiness.Core.Matrix;

/// <summary>
/// End-of-support dates of the frameworks a library can target. Data, with the source of each date; a framework
/// missing here has no known end date (the check passes it with a note, never guesses).
/// </summary>
public static class FrameworkLifecycle
{
    // .NET releases table, https://github.com/dotnet/core/blob/main/releases.md (snapshot 2026-07, standards.md §9).
    private const string Releases = "https://github.com/dotnet/core/blob/main/releases.md";

    // Older .NET (Core) rows: the end-of-life table of the same releases page, dates from memory (not re-read).
    private const string ReleasesFromMemory = Releases + " (end-of-life table; from memory)";

    // .NET Framework: https://learn.microsoft.com/lifecycle/products/microsoft-net-framework (from memory).
    private const string FrameworkLifecyclePage = "https://learn.microsoft.com/lifecycle/products/microsoft-net-framework (from memory)";

    private const string FollowsWindows = FrameworkLifecyclePage + ": 4.6.2 and later are supported as components of the "
        + "Windows versions they ship on; no end date is published";

    public static IReadOnlyList<FrameworkSupport> Entries { get; } =
    [
        Core(1, 0, ".NET Core 1.0", new(2019, 6, 27), ReleasesFromMemory),
        Core(1, 1, ".NET Core 1.1", new(2019, 6, 27), ReleasesFromMemory),
        Core(2, 0, ".NET Core 2.0", new(2018, 10, 1), ReleasesFromMemory),
        Core(2, 1, ".NET Core 2.1", new(2021, 8, 21), ReleasesFromMemory),
        Core(2, 2, ".NET Core 2.2", new(2019, 12, 23), ReleasesFromMemory),
        Core(3, 0, ".NET Core 3.0", new(2020, 3, 3), ReleasesFromMemory),
        Core(3, 1, ".NET Core 3.1", new(2022, 12, 13), ReleasesFromMemory),
        Core(5, 0, ".NET 5", new(2022, 5, 10), ReleasesFromMemory),
        Core(6, 0, ".NET 6", new(2024, 11, 12), Releases),
        Core(7, 0, ".NET 7", new(2024, 5, 14), Releases),
        Core(8, 0, ".NET 8", new(2026, 11, 10), Releases),
        Core(9, 0, ".NET 9", new(2026, 11, 10), Releases + " (extended; older pages said May 2026)"),
        Core(10, 0, ".NET 10", new(2028, 11, 14), Releases),
        Core(11, 0, ".NET 11", null, Releases + " (preview; end of support not yet published)"),
        Fx(new(2, 0), ".NET Framework 2.0", new(2011, 7, 12), FrameworkLifecyclePage),
        Fx(new(3, 0), ".NET Framework 3.0", new(2011, 7, 12), FrameworkLifecyclePage),
        Fx(new(3, 5), ".NET Framework 3.5 SP1", new(2029, 1, 9), FrameworkLifecyclePage),
        Fx(new(4, 0), ".NET Framework 4", new(2016, 1, 12), FrameworkLifecyclePage),
        Fx(new(4, 5), ".NET Framework 4.5", new(2016, 1, 12), FrameworkLifecyclePage),
        Fx(new(4, 5, 1), ".NET Framework 4.5.1", new(2016, 1, 12), FrameworkLifecyclePage),
        Fx(new(4, 5, 2), ".NET Framework 4.5.2", new(2022, 4, 26), FrameworkLifecyclePage),
        Fx(new(4, 6), ".NET Framework 4.6", new(2022, 4, 26), FrameworkLifecyclePage),
        Fx(new(4, 6, 1), ".NET Framework 4.6.1", new(2022, 4, 26), FrameworkLifecyclePage),
        Fx(new(4, 6, 2), ".NET Framework 4.6.2", null, FollowsWindows),
        Fx(new(4, 7), ".NET Framework 4.7", null, FollowsWindows),
        Fx(new(4, 7, 1), ".NET Framework 4.7.1", null, FollowsWindows),
        Fx(new(4, 7, 2), ".NET Framework 4.7.2", null, FollowsWindows),
        Fx(new(4, 8), ".NET Framework 4.8", null, FollowsWindows),
        Fx(new(4, 8, 1), ".NET Framework 4.8.1", null, FollowsWindows),
    ];

    /// <summary>
    /// The row for <paramref name="framework"/>. .NET Standard is a specification, not a runtime: it never goes out
    /// of support itself (https://learn.microsoft.com/dotnet/standard/net-standard), so it gets a row with no end date.
    /// </summary>
    public static FrameworkSupport? Find(NuGetFramework framework)
    {
        ArgumentNullException.ThrowIfNull(framework);
        if (framework.Framework == FrameworkConstants.FrameworkIdentifiers.NetStandard)
        {
            return new FrameworkSupport(framework.Framework, framework.Version, $".NET Standard {framework.Version.ToString(2)}", null,
                "https://learn.microsoft.com/dotnet/standard/net-standard (a specification; implementations carry the support dates)");
        }

        var key = Key(framework.Version, framework.Framework == FrameworkConstants.FrameworkIdentifiers.Net ? 3 : 2);
        return Entries.FirstOrDefault(e => e.Framework == framework.Framework
            && Key(e.Version, e.Framework == FrameworkConstants.FrameworkIdentifiers.Net ? 3 : 2) == key);
    }

    private static Version Key(Version v, int parts) =>
        parts == 3 ? new Version(v.Major, v.Minor, Math.Max(v.Build, 0)) : new Version(v.Major, v.Minor);

    private static FrameworkSupport Core(int major, int minor, string name, DateOnly? end, string source) =>
        new(FrameworkConstants.FrameworkIdentifiers.NetCoreApp, new Version(major, minor), name, end, source);

    private static FrameworkSupport Fx(Version version, string name, DateOnly? end, string source) =>
        new(FrameworkConstants.FrameworkIdentifiers.Net, version, name, end, source);
}
