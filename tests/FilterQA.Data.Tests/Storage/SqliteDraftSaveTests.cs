using FilterQA.Data.Tests.Infrastructure;

namespace FilterQA.Data.Tests.Storage;

/// <summary>The draft-save contract on SQLite, a temp file per test.</summary>
public sealed class SqliteDraftSaveTests : DraftSaveContract
{
    protected override Task<TestStore> OpenAsync() => TestStore.SqliteAsync();
}
