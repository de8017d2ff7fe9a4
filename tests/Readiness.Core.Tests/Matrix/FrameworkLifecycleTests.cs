using NuGet.Frameworks;

using Readiness.Core.Matrix;

namespace Readiness.Core.Tests.Matrix;

public sealed class FrameworkLifecycleTests
{
    // https://github.com/dotnet/core/blob/main/releases.md (standards.md §9): .NET 6 ended 2024-11-12, .NET 7
    // 2024-05-14, .NET 8 and 9 end 2026-11-10, .NET 10 ends 2028-11-14.
    [Theory]
    [InlineData("net6.0", "2024-11-12")]
    [InlineData("net7.0", "2024-05-14")]
    [InlineData("net8.0", "2026-11-10")]
    [InlineData("net9.0", "2026-11-10")]
    [InlineData("net10.0", "2028-11-14")]
    [InlineData("net8.0-windows", "2026-11-10")]
    [InlineData("netcoreapp3.1", "2022-12-13")] // releases.md end-of-life table, from memory
    [InlineData("net5.0", "2022-05-10")] // releases.md end-of-life table, from memory
    public void DotNetRows_CarryTheReleasesPageDates(string tfm, string end)
    {
        var support = FrameworkLifecycle.Find(NuGetFramework.Parse(tfm));

        Assert.NotNull(support);
        Assert.Equal(DateOnly.Parse(end, System.Globalization.CultureInfo.InvariantCulture), support.EndOfSupport);
        Assert.Contains("releases.md", support.Source, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("netstandard2.0")]
    [InlineData("netstandard2.1")]
    [InlineData("net472")]
    [InlineData("net48")]
    [InlineData("net11.0")]
    public void NoEndDate_IsExplicit(string tfm)
    {
        var support = FrameworkLifecycle.Find(NuGetFramework.Parse(tfm));

        Assert.NotNull(support);
        Assert.Null(support.EndOfSupport);
    }

    [Theory]
    [InlineData("net461", "2022-04-26")]
    [InlineData("net45", "2016-01-12")]
    public void OldFrameworkRows_AreMarkedFromMemory(string tfm, string end)
    {
        var support = FrameworkLifecycle.Find(NuGetFramework.Parse(tfm))!;

        Assert.Equal(DateOnly.Parse(end, System.Globalization.CultureInfo.InvariantCulture), support.EndOfSupport);
        Assert.Contains("from memory", support.Source, StringComparison.Ordinal);
    }

    [Fact]
    public void EveryRow_NamesItsSource() =>
        Assert.All(FrameworkLifecycle.Entries, e => Assert.StartsWith("https://", e.Source, StringComparison.Ordinal));

    // The TFM spellings of https://learn.microsoft.com/nuget/reference/target-frameworks, parsed by NuGet.Frameworks.
    [Theory]
    [InlineData("net8.0", ".NETCoreApp", "8.0")]
    [InlineData("netcoreapp3.1", ".NETCoreApp", "3.1")]
    [InlineData("net462", ".NETFramework", "4.6.2")]
    [InlineData("netstandard2.0", ".NETStandard", "2.0")]
    public void NuGetFrameworks_ParsesTheTfmsTheTableKeysOn(string tfm, string identifier, string version)
    {
        var framework = NuGetFramework.Parse(tfm);

        Assert.Equal(identifier, framework.Framework);
        Assert.Equal(version, framework.Version.ToString(version.Count(c => c == '.') + 1));
    }
}
