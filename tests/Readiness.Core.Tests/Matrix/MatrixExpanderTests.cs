using Readiness.Core.Configuration;
using Readiness.Core.Matrix;

namespace Readiness.Core.Tests.Matrix;

// Oracles: the worked examples of GitHub's "Running variations of jobs in a workflow" page
// (https://docs.github.com/actions/writing-workflows/choosing-what-your-workflow-does/running-variations-of-jobs-in-a-workflow),
// quoted from memory.
public sealed class MatrixExpanderTests
{
    private static IReadOnlyList<string> Expand(string yaml)
    {
        var (combos, problem) = MatrixExpander.Expand(YamlReader.Read("w.yml", yaml));
        Assert.Null(problem);
        return combos!.Select(c => string.Join(",", c.OrderBy(x => x.Key, StringComparer.Ordinal)
            .Select(x => $"{x.Key}={((ConfigScalar)x.Value).Value}"))).ToArray();
    }

    [Fact]
    public void TwoLists_GiveTheirProductInOrder() =>
        Assert.Equal(
            ["os=ubuntu-latest,version=10", "os=windows-latest,version=10", "os=ubuntu-latest,version=12",
             "os=windows-latest,version=12", "os=ubuntu-latest,version=14", "os=windows-latest,version=14"],
            Expand("version: [10, 12, 14]\nos: [ubuntu-latest, windows-latest]\n"));

    [Fact]
    public void IncludeExample_ExpandsAsDocumented() =>
        Assert.Equal(
            ["animal=cat,color=pink,fruit=apple,shape=circle", "animal=dog,color=green,fruit=apple,shape=circle",
             "animal=cat,color=pink,fruit=pear", "animal=dog,color=green,fruit=pear", "fruit=banana", "animal=cat,fruit=banana"],
            Expand("""
                fruit: [apple, pear]
                animal: [cat, dog]
                include:
                  - color: green
                  - color: pink
                    animal: cat
                  - fruit: apple
                    shape: circle
                  - fruit: banana
                  - fruit: banana
                    animal: cat
                """));

    [Fact]
    public void ExcludeExample_LeavesNineJobs()
    {
        var combos = Expand("""
            os: [macos-latest, windows-latest]
            version: [12, 14, 16]
            environment: [staging, production]
            exclude:
              - os: macos-latest
                version: 12
                environment: production
              - os: windows-latest
                version: 16
            """);

        Assert.Equal(9, combos.Count);
        Assert.DoesNotContain("environment=production,os=macos-latest,version=12", combos);
        Assert.DoesNotContain(combos, c => c.Contains("os=windows-latest,version=16", StringComparison.Ordinal));
    }

    [Fact]
    public void IncludeOnly_GivesOneJobPerEntry() =>
        Assert.Equal(["dotnet=8.0.x", "dotnet=10.0.x"], Expand("include:\n  - dotnet: 8.0.x\n  - dotnet: 10.0.x\n"));

    [Fact]
    public void ExpressionMatrix_IsUnevaluated()
    {
        var (combos, problem) = MatrixExpander.Expand(YamlReader.Read("w.yml", "x: ${{ fromJSON(needs.setup.outputs.matrix) }}\n").AsMap("m").Find("x")!.Value);

        Assert.Null(combos);
        Assert.Contains("expression", problem, StringComparison.Ordinal);
    }
}
