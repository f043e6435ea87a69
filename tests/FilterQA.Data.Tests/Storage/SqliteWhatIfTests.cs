using FilterQA.Data.Tests.Infrastructure;

namespace FilterQA.Data.Tests.Storage;

/// <summary>The what-if contract on SQLite, a temp file per test.</summary>
public sealed class SqliteWhatIfTests : WhatIfContract
{
    protected override Task<TestStore> OpenAsync() => TestStore.SqliteAsync();
}
