using FilterQA.Data.Tests.Infrastructure;

namespace FilterQA.Data.Tests.Storage;

/// <summary>The release contract on PostgreSQL, one database for this class.</summary>
public sealed class PostgresReleaseTests(PostgresDatabase database) : ReleaseContract, IClassFixture<PostgresDatabase>, IPostgresTests
{
    protected override Task<TestStore> OpenAsync() => Task.FromResult(TestStore.Postgres(database));
}
