using Readiness.Service.Storage;

namespace Readiness.Service.Tests.Storage;

/// <summary>One store kind for the contract tests: a fresh, empty database per test class instance.</summary>
public interface IStoreBackend : IDisposable
{
    IJobStore Jobs(TimeProvider time, JobStoreOptions? options = null);

    IRunStore Runs(TimeProvider time);

    /// <summary>A rate-limit store on the same database, as another instance would open it.</summary>
    IForgeLimitStore Limits();
}
