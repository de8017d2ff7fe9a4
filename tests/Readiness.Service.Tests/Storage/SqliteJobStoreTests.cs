namespace Readiness.Service.Tests.Storage;

public sealed class SqliteJobStoreTests() : JobStoreContract(new SqliteBackend());
