using Readiness.Testing;

namespace Readiness.Service.Tests.Storage;

/// <summary>The test classes that share one PostgreSQL server (started once when CI did not start one).</summary>
[CollectionDefinition(Name)]
public sealed class PostgresCollection : ICollectionFixture<PostgresCluster>
{
    public const string Name = "postgres";
}
