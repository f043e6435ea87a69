using FilterQA.Core.Decisions;
using FilterQA.Data.Services;
using FilterQA.Data.Services.Certificates;

namespace FilterQA.Data.Tests.Infrastructure;

/// <summary>Certificate services over a test store, and lots brought to a known state (invented scenario names).</summary>
public static class CertificateSetup
{
    public const string BaseUrl = "https://qc.tarnwell.example";

    public static CertificateOptions Options()
    {
        var options = new CertificateOptions { IssuerName = "Tarnwell Marine Electronics", NumberPrefix = "TME-COC", PublicBaseUrl = BaseUrl };
        options.IssuerAddressLines.Add("4 Quay Street, Tarnwell");
        return options;
    }

    public static CertificateService Certificates(this TestStore store) => new(store.Contexts, store.Lots, Options(), store.Clock);

    /// <summary>A 100 % inspected lot whose units get the given verdicts (seed = unit index + 1), decided by the plan.</summary>
    public static async Task<PreparedLot> DecidedLotAsync(this TestStore store, params UnitVerdict[] verdicts)
    {
        ArgumentNullException.ThrowIfNull(store);
        ArgumentNullException.ThrowIfNull(verdicts);
        PreparedLot lot = await StoredLotAsync(store, verdicts.Length, verdicts);
        await store.Lots.DecideAsync(lot.LotNumber, Samples.Approver);
        return lot;
    }

    /// <summary>A 100 % inspected lot of <paramref name="quantity"/> with the given units stored and not decided.</summary>
    public static async Task<PreparedLot> StoredLotAsync(this TestStore store, int quantity, params UnitVerdict[] verdicts)
    {
        ArgumentNullException.ThrowIfNull(store);
        ArgumentNullException.ThrowIfNull(verdicts);
        PreparedLot lot = await store.PrepareLotAsync(PlanRequest.FullInspection(), quantity: quantity);
        for (int i = 0; i < verdicts.Length; i++)
        {
            string[] failing = verdicts[i] == UnitVerdict.NoGo ? ["loss"] : [];
            await store.Measurements.StoreAsync(Samples.Measurement(lot.LotNumber, $"S{i + 1:0000}", lot.Template, verdicts[i], lot.Station,
                store.Clock.GetUtcNow(), i + 1, failing));
            store.Clock.Advance(TimeSpan.FromMinutes(1));
        }
        return lot;
    }
}
