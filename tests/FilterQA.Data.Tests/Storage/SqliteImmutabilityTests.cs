using FilterQA.Data.Tests.Infrastructure;

namespace FilterQA.Data.Tests.Storage;

/// <summary>The immutability contract on SQLite, a temp file per test.</summary>
public sealed class SqliteImmutabilityTests : ImmutabilityContract
{
    protected override Task<TestStore> OpenAsync() => TestStore.SqliteAsync();
}
