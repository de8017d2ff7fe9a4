using Readiness.Core.Matrix;
using Readiness.Testing;

namespace Readiness.Core.Tests.Matrix;

// Workflow syntax per GitHub's workflow syntax reference and the actions/setup-dotnet README (dotnet-version as one
// value, a list or a multi-line string; global-json-file), both from memory.
public sealed class WorkflowSdkReaderTests
{
    private static CiSdkReport Read(string yaml, string? globalJson = null)
    {
        var files = new InMemoryFileTree().Add(".github/workflows/ci.yml", yaml);
        if (globalJson is not null)
        {
            files.Add("global.json", globalJson);
        }

        return WorkflowSdkReader.Read(files);
    }

    private static string Sdks(CiSdkReport report) => string.Join(" ", report.Sdks.Select(s => $"{s.Text}@{s.Line}"));

    [Fact]
    public void SingleValue_IsReadWithItsLine()
    {
        var report = Read("""
            on: push
            jobs:
              build:
                runs-on: ubuntu-latest
                steps:
                  - uses: actions/checkout@v4
                  - uses: actions/setup-dotnet@v4
                    with:
                      dotnet-version: 10.0.x
            """);

        Assert.Equal("10.0.x@9", Sdks(report));
        Assert.Equal(10, report.Sdks[0].Major);
        Assert.Empty(report.Unevaluated);
    }

    [Fact]
    public void ListAndMultiLineString_AreEachRead()
    {
        var report = Read("""
            jobs:
              a:
                steps:
                  - uses: actions/setup-dotnet@v4
                    with:
                      dotnet-version: [8.0.x, '9.0.1xx']
              b:
                steps:
                  - uses: actions/setup-dotnet@v4
                    with:
                      dotnet-version: |
                        6.0.x
                        10.0.100
            """);

        Assert.Equal("8.0.x@6 9.0.1xx@6 6.0.x@12 10.0.100@13", Sdks(report));
    }

    [Fact]
    public void MatrixExpression_TakesEveryIncludedAndNotExcludedValue()
    {
        var report = Read("""
            jobs:
              test:
                strategy:
                  matrix:
                    os: [ubuntu-latest, windows-latest]
                    dotnet: ['8.0', '9.0', '10.0']
                    exclude:
                      - dotnet: '9.0'
                    include:
                      - os: macos-latest
                        dotnet: '11.0'
                steps:
                  - uses: actions/setup-dotnet@v4
                    with:
                      dotnet-version: ${{ matrix.dotnet }}.x
            """);

        Assert.Equal("8.0.x@15 10.0.x@15 11.0.x@15", Sdks(report));
    }

    [Fact]
    public void EnvExpression_IsSubstitutedFromTheNearestScope()
    {
        var report = Read("""
            env:
              DOTNET_VERSION: 8.0.x
            jobs:
              build:
                env:
                  DOTNET_VERSION: 10.0.x
                steps:
                  - uses: actions/setup-dotnet@v4
                    with:
                      dotnet-version: ${{ env.DOTNET_VERSION }}
            """);

        Assert.Equal("10.0.x@10", Sdks(report));
    }

    [Fact]
    public void RunTimeExpression_IsReportedAsUnevaluated()
    {
        var report = Read("""
            jobs:
              build:
                steps:
                  - uses: actions/setup-dotnet@v4
                    with:
                      dotnet-version: ${{ inputs.sdk }}
            """);

        Assert.Empty(report.Sdks);
        Assert.Contains(report.Unevaluated, u => u.StartsWith(".github/workflows/ci.yml:6:", StringComparison.Ordinal) && u.Contains("inputs.sdk", StringComparison.Ordinal));
    }

    [Fact]
    public void WorkflowWithAnchors_IsUnevaluatedNotFatal()
    {
        var files = new InMemoryFileTree()
            .Add(".github/workflows/anchors.yml", "defaults: &d\n  dotnet-version: 8.0.x\njobs:\n  a:\n    steps:\n      - uses: actions/setup-dotnet@v4\n        with: *d\n")
            .Add(".github/workflows/ci.yml", "jobs:\n  b:\n    steps:\n      - uses: actions/setup-dotnet@v4\n        with:\n          dotnet-version: 10.0.x\n");

        var report = WorkflowSdkReader.Read(files);

        Assert.Equal("10.0.x@6", Sdks(report));
        Assert.Contains(report.Unevaluated, u => u.StartsWith(".github/workflows/anchors.yml:1:", StringComparison.Ordinal) && u.Contains("anchors", StringComparison.Ordinal));
    }

    [Fact]
    public void GlobalJson_CountsWithItsLine()
    {
        var report = Read(
            "jobs:\n  build:\n    steps:\n      - uses: actions/setup-dotnet@v4\n        with:\n          global-json-file: ./global.json\n",
            "{\n  \"sdk\": {\n    \"version\": \"10.0.401\",\n    \"rollForward\": \"latestFeature\"\n  }\n}\n");

        Assert.Equal("10.0.401@3", Sdks(report));
        Assert.Equal("global.json", report.Sdks[0].Path);
    }

    [Fact]
    public void NoWorkflows_MeansNoCi()
    {
        var report = WorkflowSdkReader.Read(new InMemoryFileTree().Add("global.json", "{\"sdk\":{\"version\":\"10.0.100\"}}"));

        Assert.False(report.HasCi);
        Assert.Empty(report.Sdks);
    }

    [Theory]
    [InlineData("8", 8)]
    [InlineData("8.0", 8)]
    [InlineData("8.x", 8)]
    [InlineData("8.0.x", 8)]
    [InlineData("8.0.1xx", 8)]
    [InlineData("10.0.100", 10)]
    [InlineData("9.0.100-rc.1.24452.12", 9)]
    [InlineData("latest", null)]
    [InlineData("", null)]
    public void SdkSpecs_GiveTheirMajor(string text, int? major) => Assert.Equal(major, SdkVersions.Major(text));
}
