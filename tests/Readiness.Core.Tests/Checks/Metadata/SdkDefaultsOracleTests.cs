using System.Text.Json;
using Readiness.Core.Checks.Metadata;
using Readiness.Core.Projects;
using Readiness.Core.Reports;
using Readiness.Testing;
using static Readiness.Core.Tests.Checks.CheckHarness;

namespace Readiness.Core.Tests.Checks.Metadata;

/// <summary>The SDK's own defaults, read with <c>dotnet msbuild -getProperty</c> (a reference tool), are what the check flags.</summary>
[Trait("Category", "DotnetMsbuild")]
public sealed class SdkDefaultsOracleTests
{
    [Fact]
    public void BareProjectsEvaluatedDefaults_AreFlagged()
    {
        using var folder = new TempDirectory("readiness-sdk-defaults-");
        var project = folder.Combine("Bramble.Probe.csproj");
        File.WriteAllText(project, "<Project Sdk=\"Microsoft.NET.Sdk\"><PropertyGroup><TargetFramework>netstandard2.0</TargetFramework></PropertyGroup></Project>");

        var properties = GetProperties(project, "PackageDescription", "Authors", "AssemblyName");

        Assert.Equal(PackageMetadataCheck.SdkDefaultDescription, properties["PackageDescription"]);
        Assert.Equal(properties["AssemblyName"], properties["Authors"]);

        // The same values as the static model would hold them, had the project written them out.
        var info = ProjectFixtures.Project("src/Bramble.Probe/Bramble.Probe.csproj")
            .Property("PackageDescription", properties["PackageDescription"])
            .Property("Authors", properties["Authors"])
            .Build();
        var finding = Single(Run(new PackageMetadataCheck(), ProjectFixtures.Model(info)));

        AssertStatus(CheckStatus.Fail, finding);
        Assert.Contains("PackageDescription is the SDK default", finding.Message, StringComparison.Ordinal);
        Assert.Contains("Authors is 'Bramble.Probe', the SDK default", finding.Message, StringComparison.Ordinal);
    }

    private static Dictionary<string, string> GetProperties(string project, params string[] names)
    {
        var result = DotnetCli.Run(Path.GetDirectoryName(project)!, ["msbuild", project, .. names.Select(n => "-getProperty:" + n)]);
        Assert.True(result.Succeeded, result.StdErr);
        var output = result.StdOut;
        using var doc = JsonDocument.Parse(output);
        return doc.RootElement.GetProperty("Properties").EnumerateObject().ToDictionary(x => x.Name, x => x.Value.GetString() ?? string.Empty);
    }
}
