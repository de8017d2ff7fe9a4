using Readiness.Service.Worker;

namespace Readiness.Service.Tests.Worker;

public sealed class TaskListConfirmationsTests
{
    [Fact]
    public void TickedItems_AsTheMarkdownReportWritesThem_AreConfirmations()
    {
        // GFM spec, task list items: "[x]" and "[X]" are checked, "[ ]" is not.
        var body = """
            Release notes here.

            ### Manual items

            - [x] Called 1,000 times without memory growth \(manual.soak\) **block**
            - [ ] Announced on the mailing list \(manual.announce\)
            * [X] Docs site rebuilt (manual.docs-site)
              - [x] nested item (manual.nested_one)
            1. [x] numbered (manual.numbered)
            """;
        Assert.Equal(["soak", "docs-site", "nested_one", "numbered"], TaskListConfirmations.Parse(body));
    }

    [Theory]
    [InlineData(null)]
    [InlineData("")]
    [InlineData("- [ ] soak (manual.soak)")]
    [InlineData("[x] not a list item (manual.soak)")]
    [InlineData("- [x] no id here")]
    [InlineData("- [x] (check.soak) is not a manual item")]
    [InlineData("-[x] no space after the marker (manual.soak)")]
    public void Unticked_OrNotATaskItem_ConfirmsNothing(string? body) =>
        Assert.Empty(TaskListConfirmations.Parse(body));

    [Fact]
    public void RepeatedItem_CountsOnce() =>
        Assert.Equal(["soak"], TaskListConfirmations.Parse("- [x] a (manual.soak)\r\n- [x] b (manual.soak)"));
}
