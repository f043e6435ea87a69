using FilterQA.Data.Tests.Infrastructure;

namespace FilterQA.Data.Tests.Storage;

/// <summary>The lot contract on SQLite, a temp file per test.</summary>
public sealed class SqliteLotTests : LotContract
{
    protected override Task<TestStore> OpenAsync() => TestStore.SqliteAsync();
}
