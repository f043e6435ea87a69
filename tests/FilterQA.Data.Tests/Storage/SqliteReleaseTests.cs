using FilterQA.Data.Tests.Infrastructure;

namespace FilterQA.Data.Tests.Storage;

/// <summary>The release contract on SQLite, a temp file per test.</summary>
public sealed class SqliteReleaseTests : ReleaseContract
{
    protected override Task<TestStore> OpenAsync() => TestStore.SqliteAsync();
}
