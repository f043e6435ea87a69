using FilterQA.Data.Tests.Infrastructure;

namespace FilterQA.Data.Tests.Storage;

/// <summary>The draft-save contract on PostgreSQL, one database for this class.</summary>
public sealed class PostgresDraftSaveTests(PostgresDatabase database) : DraftSaveContract, IClassFixture<PostgresDatabase>, IPostgresTests
{
    protected override Task<TestStore> OpenAsync() => Task.FromResult(TestStore.Postgres(database));
}
