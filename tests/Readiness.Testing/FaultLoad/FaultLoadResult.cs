using System.Globalization;
using System.Text;

namespace Readiness.Testing.FaultLoad;

/// <summary>What one fault-and-load run measured.</summary>
public sealed record FaultLoadResult(
    int Deliveries,
    IReadOnlyDictionary<int, int> Answers,
    int RefusedConnections,
    double P50Milliseconds,
    double P99Milliseconds,
    double MaxMilliseconds,
    int Kills,
    int Redeliveries,
    int RedeliveriesAnsweredDuplicate,
    long ExtraJobsFromRedeliveries,
    int PullRequests,
    int PullRequestsWithoutComment,
    int DuplicatedComments,
    int HeadsWithoutStatus,
    long FailedJobs,
    int InjectedForgeFaults,
    int CallsSoonerThanRetryAfter,
    double DrainSeconds)
{
    /// <summary>Non-2xx answers the senders got (connection refusals by killed instances are counted apart).</summary>
    public int NonSuccessAnswers => Answers.Where(a => a.Key is < 200 or > 299).Sum(a => a.Value);

    /// <summary>Whether every delivery ended in exactly one comment and a status, nothing was duplicated or failed.</summary>
    public bool Sound =>
        PullRequestsWithoutComment == 0 && DuplicatedComments == 0 && HeadsWithoutStatus == 0 && FailedJobs == 0
        && ExtraJobsFromRedeliveries == 0 && RedeliveriesAnsweredDuplicate == Redeliveries && NonSuccessAnswers == 0
        && CallsSoonerThanRetryAfter == 0;

    public string Describe()
    {
        var b = new StringBuilder();
        b.AppendLine(CultureInfo.InvariantCulture, $"deliveries           {Deliveries}; answers {string.Join(", ", Answers.OrderBy(a => a.Key).Select(a => $"{a.Key} x{a.Value}"))}; refused connections (killed instance) {RefusedConnections}");
        b.AppendLine(CultureInfo.InvariantCulture, $"webhook answer time  p50 {P50Milliseconds:0.0} ms, p99 {P99Milliseconds:0.0} ms, max {MaxMilliseconds:0.0} ms (target p99 <= 50 ms)");
        b.AppendLine(CultureInfo.InvariantCulture, $"kill -9 cycles       {Kills}");
        b.AppendLine(CultureInfo.InvariantCulture, $"redeliveries         {Redeliveries}: answered duplicate {RedeliveriesAnsweredDuplicate}, extra jobs {ExtraJobsFromRedeliveries}");
        b.AppendLine(CultureInfo.InvariantCulture, $"pull requests        {PullRequests}: without a comment (lost) {PullRequestsWithoutComment}, duplicated comments {DuplicatedComments}, heads without a status {HeadsWithoutStatus}");
        b.AppendLine(CultureInfo.InvariantCulture, $"forge faults         {InjectedForgeFaults} injected; failed jobs {FailedJobs}; calls sooner than a retry-after allowed {CallsSoonerThanRetryAfter}");
        b.AppendLine(CultureInfo.InvariantCulture, $"all jobs done after  {DrainSeconds:0.0} s from the first delivery");
        b.Append(Sound ? "verdict              sound: nothing lost, duplicated or retried early" : "verdict              PROBLEM: see the figures above");
        return b.ToString();
    }
}
