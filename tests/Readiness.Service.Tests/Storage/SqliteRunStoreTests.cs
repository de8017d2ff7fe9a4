namespace Readiness.Service.Tests.Storage;

public sealed class SqliteRunStoreTests() : RunStoreContract(new SqliteBackend());
