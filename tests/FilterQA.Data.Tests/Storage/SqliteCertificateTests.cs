using FilterQA.Data.Tests.Infrastructure;

namespace FilterQA.Data.Tests.Storage;

/// <summary>The certificate contract on SQLite, a temp file per test.</summary>
public sealed class SqliteCertificateTests : CertificateContract
{
    protected override Task<TestStore> OpenAsync() => TestStore.SqliteAsync();
}
