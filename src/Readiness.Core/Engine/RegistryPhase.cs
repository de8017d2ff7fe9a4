using System.Globalization;

using Readiness.Core.Configuration;
using Readiness.Core.Registry;

namespace Readiness.Core.Engine;

/// <summary>
/// Asks the registry about every id the checks need, in parallel, within one time bound. Any failure becomes a
/// problem on that id (checks then skip); when every id failed, the facts say the registry is unavailable. The phase
/// never throws and never outlives its bound.
/// </summary>
public static class RegistryPhase
{
    public static readonly TimeSpan DefaultTimeout = TimeSpan.FromSeconds(10);

    /// <summary>The shortest and longest bound a configuration may set: a repository cannot switch the phase off.</summary>
    public static readonly TimeSpan MinTimeout = TimeSpan.FromSeconds(1);

    public static readonly TimeSpan MaxTimeout = TimeSpan.FromSeconds(60);

    /// <summary>
    /// <c>registry-timeout</c> from the configuration (seconds, e.g. <c>10</c> or <c>2.5s</c>), kept within
    /// [<see cref="MinTimeout"/>, <see cref="MaxTimeout"/>]; <paramref name="fallback"/> when it is not set.
    /// </summary>
    public static TimeSpan TimeoutFrom(RepositoryConfig config, TimeSpan fallback)
    {
        ArgumentNullException.ThrowIfNull(config);
        if (!config.Values.TryGetValue("registry-timeout", out var node))
        {
            return fallback;
        }

        var text = node.AsString("registry-timeout").Trim();
        text = text.EndsWith('s') ? text[..^1].TrimEnd() : text;
        if (!double.TryParse(text, NumberStyles.AllowDecimalPoint, CultureInfo.InvariantCulture, out var seconds) || seconds <= 0)
        {
            throw new ConfigurationException(node.Mark, "registry-timeout must be a number of seconds, such as 10 or 2.5");
        }

        return Clamp(TimeSpan.FromSeconds(seconds));
    }

    /// <summary>
    /// The one rule for the bound: an explicit value (command line, else environment) wins over the repository's
    /// <c>registry-timeout</c>, which wins over <see cref="DefaultTimeout"/>; every source is kept within
    /// [<see cref="MinTimeout"/>, <see cref="MaxTimeout"/>].
    /// </summary>
    public static TimeSpan Resolve(TimeSpan? explicitTimeout, RepositoryConfig config)
    {
        ArgumentNullException.ThrowIfNull(config);
        return explicitTimeout is { } given ? Clamp(given) : TimeoutFrom(config, DefaultTimeout);
    }

    public static TimeSpan Clamp(TimeSpan timeout) => timeout < MinTimeout ? MinTimeout : timeout > MaxTimeout ? MaxTimeout : timeout;

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

        // When no id got an answer, the feed as a whole is out of reach: say so once, with the first reason.
        var unavailable = answers.Count > 0 && answers.Values.All(a => !a.Available)
            ? answers[distinct[0]].Problem
            : null;
        return new RegistryFacts(registry.Source, answers, unavailable);
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
