using FilterQA.Data.Tests.Infrastructure;

namespace FilterQA.Data.Tests.Storage;

/// <summary>The intake contract on PostgreSQL, one database for this class.</summary>
public sealed class PostgresIntakeTests(PostgresDatabase database) : IntakeContract, IClassFixture<PostgresDatabase>, IPostgresTests
{
    protected override Task<TestStore> OpenAsync() => Task.FromResult(TestStore.Postgres(database));
}
