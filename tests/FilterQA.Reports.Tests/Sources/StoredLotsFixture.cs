using FilterQA.Reports.Tests.Infrastructure;

namespace FilterQA.Reports.Tests.Sources;

/// <summary>One database for the read-only report tests: a rejected lot and, a day later, an accepted one of the same part.</summary>
public sealed class StoredLotsFixture : IAsyncLifetime
{
    public const string RejectedLot = "VP-2611-0101";
    public const string AcceptedLot = "VP-2611-0102";

    public ReportStore Store { get; private set; } = null!;

    public async Task InitializeAsync()
    {
        Store = await ReportStore.CreateAsync();
        await Store.LotAsync(RejectedLot, 24, 0.35, 101, decide: true);
        Store.Clock.Advance(TimeSpan.FromDays(1));
        await Store.LotAsync(AcceptedLot, 6, 0, 102, decide: true);
    }

    public async Task DisposeAsync() => await Store.DisposeAsync();
}
