using FilterQA.Data.Tests.Infrastructure;

namespace FilterQA.Data.Tests.Storage;

/// <summary>The what-if contract on PostgreSQL, one database for this class.</summary>
public sealed class PostgresWhatIfTests(PostgresDatabase database) : WhatIfContract, IClassFixture<PostgresDatabase>, IPostgresTests
{
    protected override Task<TestStore> OpenAsync() => Task.FromResult(TestStore.Postgres(database));
}
