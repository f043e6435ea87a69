using FilterQA.Data.Tests.Infrastructure;

namespace FilterQA.Data.Tests.Storage;

/// <summary>The write-path contract on SQLite, a temp file per test.</summary>
public sealed class SqliteWritePathTests : WritePathContract
{
    protected override Task<TestStore> OpenAsync() => TestStore.SqliteAsync();
}
