using Readiness.Core.Engine;
using static Readiness.Testing.RegistryTestProjects;

namespace Readiness.Core.Tests.Engine;

public class RegistryIdsTests
{
    [Fact]
    public void PackagesAndDeclaredDependencies_AreAsked_PrivateOnesAreNot()
    {
        // PrivateAssets="all" and IncludeAssets="none" keep a reference out of the nuspec (NuGet pack, standards.md §5).
        var model = Model(Library(
            "Bramble.Sketches",
            "2.4.0",
            Reference("Lanternfly.Host.Abstractions", "3.1.0"),
            Reference("Lanternfly.Host.Runtime", "3.1.0", ("PrivateAssets", "all")),
            Reference("Bramble.Analyzers", "1.0.0", ("IncludeAssets", "none"))));

        var ids = ReadinessRunner.RegistryIds(model).ToList();

        Assert.Equal(["Bramble.Sketches", "Lanternfly.Host.Abstractions"], ids);
    }
}
