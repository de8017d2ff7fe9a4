using Readiness.Testing;

namespace Readiness.Service.Tests.Storage;

[Collection(PostgresCollection.Name)]
public sealed class PostgresRunStoreTests(PostgresCluster cluster) : RunStoreContract(new PostgresBackend(cluster));
