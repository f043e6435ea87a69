using FilterQA.Data.Tests.Infrastructure;

namespace FilterQA.Data.Tests.Storage;

/// <summary>The immutability contract on PostgreSQL, one database for this class.</summary>
public sealed class PostgresImmutabilityTests(PostgresDatabase database) : ImmutabilityContract, IClassFixture<PostgresDatabase>, IPostgresTests
{
    protected override Task<TestStore> OpenAsync() => Task.FromResult(TestStore.Postgres(database));
}
