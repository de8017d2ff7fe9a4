using Readiness.Testing;

namespace Readiness.Service.Tests.EndToEnd;

public sealed class JobLoggingTests : ServiceTestBase
{
    [Fact]
    public async Task EveryLineOfAJob_CarriesItsDeliveryId()
    {
        var head = Repo.Work.Sha(ReleasePullRequestRepository.PullRequestBranch);
        Forge.FailNext("POST", "/statuses/", 502);
        await Host.DeliverAsync(Repo.Payload("opened", 1, head), "delivery-7f3a");
        await Host.WaitForIdleAsync();

        // The worker's, the processor's and the forge retry's lines (a 502 made one) all name the delivery.
        var jobLines = Logs.Lines.Where(l => l.Contains("Readiness.Service.Worker.", StringComparison.Ordinal) || l.Contains("Readiness.Service.Forge.ForgeRetryPolicy", StringComparison.Ordinal)).ToList();
        Assert.Contains(jobLines, l => l.Contains("Reporting on", StringComparison.Ordinal));
        Assert.Contains(jobLines, l => l.Contains("retry 1", StringComparison.Ordinal));
        Assert.All(jobLines, l => Assert.Contains("DeliveryId=delivery-7f3a", l, StringComparison.Ordinal));
    }
}
