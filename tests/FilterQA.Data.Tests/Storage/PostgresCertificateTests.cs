using FilterQA.Data.Tests.Infrastructure;

namespace FilterQA.Data.Tests.Storage;

/// <summary>The certificate contract on PostgreSQL, one database for this class.</summary>
public sealed class PostgresCertificateTests(PostgresDatabase database) : CertificateContract, IClassFixture<PostgresDatabase>, IPostgresTests
{
    protected override Task<TestStore> OpenAsync() => Task.FromResult(TestStore.Postgres(database));
}
