using FilterQA.Data.Tests.Infrastructure;

namespace FilterQA.Data.Tests.Storage;

/// <summary>The audit log query contract on PostgreSQL, one database for this class.</summary>
public sealed class PostgresAuditLogTests(PostgresDatabase database) : AuditLogContract, IClassFixture<PostgresDatabase>, IPostgresTests
{
    protected override Task<TestStore> OpenAsync() => Task.FromResult(TestStore.Postgres(database));
}
