using FilterQA.Data.Tests.Infrastructure;

namespace FilterQA.Data.Tests.Storage;

/// <summary>The audit log query contract on SQLite, a temp file per test.</summary>
public sealed class SqliteAuditLogTests : AuditLogContract
{
    protected override Task<TestStore> OpenAsync() => TestStore.SqliteAsync();
}
