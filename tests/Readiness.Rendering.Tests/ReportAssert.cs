using Readiness.Core.Reports;

namespace Readiness.Rendering.Tests;

/// <summary>Deep equality of reports: records compare lists by reference, so lists are compared item by item.</summary>
internal static class ReportAssert
{
    public static void Equal(Report expected, Report actual)
    {
        Assert.Equal(expected.Subject, actual.Subject);
        Assert.Equal(expected.Ready, actual.Ready);
        Assert.Equal(expected.Summary, actual.Summary);
        Assert.Equal(expected.GeneratedAt, actual.GeneratedAt);
        Assert.Equal(expected.GeneratedAt.Offset, actual.GeneratedAt.Offset);
        Assert.Equal(expected.Notes, actual.Notes);
        Assert.Equal(expected.Results.Count, actual.Results.Count);
        foreach (var (e, a) in expected.Results.Zip(actual.Results))
        {
            Assert.Equal(e with { Evidence = [] }, a with { Evidence = [] });
            Assert.Equal(e.Evidence, a.Evidence);
        }
    }
}
