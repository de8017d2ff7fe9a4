using Readiness.Core.Checks;
using Readiness.Core.Reports;

namespace Readiness.Core.Engine;

/// <summary>The checks the engine knows, by id. Immutable once built.</summary>
public sealed class CheckCatalog
{
    private readonly Dictionary<string, ICheck> byId;

    public CheckCatalog(IEnumerable<ICheck> checks)
    {
        ArgumentNullException.ThrowIfNull(checks);
        Checks = checks.OrderBy(c => c.Descriptor.Id, StringComparer.Ordinal).ToArray();
        byId = new Dictionary<string, ICheck>(StringComparer.Ordinal);
        foreach (var check in Checks)
        {
            if (!byId.TryAdd(check.Descriptor.Id, check))
            {
                throw new InvalidOperationException($"two checks share the id {check.Descriptor.Id}");
            }
        }

        Ids = byId.Keys.ToHashSet(StringComparer.Ordinal);
        DefaultSeverities = Checks.ToDictionary(c => c.Descriptor.Id, c => c.Descriptor.DefaultSeverity, StringComparer.Ordinal);
    }

    public IReadOnlyList<ICheck> Checks { get; }

    public IReadOnlySet<string> Ids { get; }

    public IReadOnlyDictionary<string, Severity> DefaultSeverities { get; }

    /// <summary>Every sealed <see cref="ICheck"/> with a public parameterless constructor in Core.</summary>
    public static CheckCatalog BuiltIn() =>
        new(typeof(ICheck).Assembly.GetTypes()
            .Where(t => t is { IsClass: true, IsAbstract: false, IsSealed: true } && typeof(ICheck).IsAssignableFrom(t)
                && t.GetConstructor(Type.EmptyTypes) is not null)
            .Select(t => (ICheck)Activator.CreateInstance(t)!));

    public ICheck? Find(string id) => byId.GetValueOrDefault(id);
}
