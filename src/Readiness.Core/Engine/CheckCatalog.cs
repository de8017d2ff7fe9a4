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

    /// <summary>The built-in checks (<see cref="BuiltInChecks"/>).</summary>
    public static CheckCatalog BuiltIn() => new(BuiltInChecks.Create());

    public ICheck? Find(string id) => byId.GetValueOrDefault(id);
}
