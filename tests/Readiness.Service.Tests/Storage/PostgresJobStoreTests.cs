using Readiness.Testing;

namespace Readiness.Service.Tests.Storage;

[Collection(PostgresCollection.Name)]
public sealed class PostgresJobStoreTests(PostgresCluster cluster) : JobStoreContract(new PostgresBackend(cluster));
