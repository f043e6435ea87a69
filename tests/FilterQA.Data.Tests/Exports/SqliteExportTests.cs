using FilterQA.Data.Tests.Infrastructure;

namespace FilterQA.Data.Tests.Exports;

/// <summary>The export contract on SQLite, a temp file per test.</summary>
public sealed class SqliteExportTests : ExportContract
{
    protected override Task<TestStore> OpenAsync() => TestStore.SqliteAsync();
}
