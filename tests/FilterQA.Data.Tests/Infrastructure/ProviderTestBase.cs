namespace FilterQA.Data.Tests.Infrastructure;

/// <summary>Opens a fresh store before each test and closes it after; the concrete class says which provider.</summary>
public abstract class ProviderTestBase : IAsyncLifetime
{
    private TestStore? _store;

    protected TestStore Store => _store ?? throw new InvalidOperationException("the store is opened in InitializeAsync");

    protected abstract Task<TestStore> OpenAsync();

    public async Task InitializeAsync() => _store = await OpenAsync();

    public async Task DisposeAsync()
    {
        if (_store is not null)
        {
            await _store.DisposeAsync();
        }
    }
}
