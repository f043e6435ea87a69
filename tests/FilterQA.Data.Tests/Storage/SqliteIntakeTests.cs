using FilterQA.Data.Tests.Infrastructure;

namespace FilterQA.Data.Tests.Storage;

/// <summary>The intake contract on SQLite, a temp file per test.</summary>
public sealed class SqliteIntakeTests : IntakeContract
{
    protected override Task<TestStore> OpenAsync() => TestStore.SqliteAsync();
}
