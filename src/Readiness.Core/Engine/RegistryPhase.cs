using Readiness.Core.Registry;

namespace Readiness.Core.Engine;

/// <summary>
/// Asks the registry about every id the checks need, in parallel, within one time bound. Any failure becomes a
/// problem on that id (checks then skip); the phase never throws and never outlives its bound.
/// </summary>
public static class RegistryPhase
{
    public static readonly TimeSpan DefaultTimeout = TimeSpan.FromSeconds(10);

    public static async Task<RegistryFacts> GatherAsync(
        IPackageRegistry registry, IEnumerable<string> ids, TimeSpan timeout, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(registry);
        ArgumentNullException.ThrowIfNull(ids);
        using var bound = CancellationTokenSource.CreateLinkedTokenSource(cancellationToken);
        bound.CancelAfter(timeout);
        var distinct = ids.Distinct(StringComparer.OrdinalIgnoreCase).ToArray();
        var tasks = distinct.Select(id => LookupOne(registry, id, timeout, bound.Token)).ToArray();
        var all = Task.WhenAll(tasks);
        await Task.WhenAny(all, Task.Delay(timeout + TimeSpan.FromMilliseconds(250), CancellationToken.None)).ConfigureAwait(false);
        var answers = new Dictionary<string, PackageLookup>(StringComparer.OrdinalIgnoreCase);
        for (var i = 0; i < distinct.Length; i++)
        {
            answers[distinct[i]] = tasks[i].IsCompletedSuccessfully
                ? tasks[i].Result
                : PackageLookup.Unavailable(distinct[i], $"no answer from {registry.Source} within {timeout.TotalSeconds:0.#} s");
        }

        return new RegistryFacts(registry.Source, answers);
    }

    private static async Task<PackageLookup> LookupOne(IPackageRegistry registry, string id, TimeSpan timeout, CancellationToken token)
    {
        try
        {
            return await registry.LookupAsync(id, token).ConfigureAwait(false);
        }
        catch (OperationCanceledException)
        {
            return PackageLookup.Unavailable(id, $"no answer from {registry.Source} within {timeout.TotalSeconds:0.#} s");
        }
#pragma warning disable CA1031 // any transport failure is a skip with its reason, never a crash or a pass
        catch (Exception e)
#pragma warning restore CA1031
        {
            return PackageLookup.Unavailable(id, $"{registry.Source} could not be read: {e.Message}");
        }
    }
}
