using Readiness.Core.Checks;
using Readiness.Core.Engine;

namespace Readiness.Core.Tests.Engine;

/// <summary>The written-out list of built-in checks holds every check class of Core, once.</summary>
public sealed class BuiltInChecksTests
{
    [Fact]
    public void List_HoldsEverySealedCheckClassOfCore_Once()
    {
        var classes = typeof(ICheck).Assembly.GetTypes()
            .Where(t => t is { IsClass: true, IsAbstract: false } && typeof(ICheck).IsAssignableFrom(t))
            .Select(t => t.FullName!)
            .Order(StringComparer.Ordinal)
            .ToArray();
        var listed = BuiltInChecks.Create().Select(c => c.GetType().FullName!).Order(StringComparer.Ordinal).ToArray();

        Assert.NotEmpty(classes);
        Assert.Equal(classes, listed);
    }

    [Fact]
    public void Catalog_HasOneCheckPerKnownId()
    {
        var catalog = CheckCatalog.BuiltIn();

        Assert.Equal(CheckIds.All.Order(StringComparer.Ordinal), catalog.Ids.Order(StringComparer.Ordinal));
    }
}
