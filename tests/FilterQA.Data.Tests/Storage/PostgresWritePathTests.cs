using FilterQA.Data.Tests.Infrastructure;

namespace FilterQA.Data.Tests.Storage;

/// <summary>The write-path contract on PostgreSQL, one database for this class.</summary>
public sealed class PostgresWritePathTests(PostgresDatabase database) : WritePathContract, IClassFixture<PostgresDatabase>, IPostgresTests
{
    protected override Task<TestStore> OpenAsync() => Task.FromResult(TestStore.Postgres(database));
}
