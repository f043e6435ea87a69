using FilterQA.Core.Statistics;
using FilterQA.Data.Services;

namespace FilterQA.Data.Tests.Infrastructure;

/// <summary>Short set-ups the storage tests share.</summary>
public static class StoreExtensions
{
    /// <summary>Registers a new part (released revision 1), a station, and a lot with the given plan.</summary>
    public static async Task<PreparedLot> PrepareLotAsync(this TestStore store, PlanRequest plan, int quantity = 40,
        RetestPolicy? retests = null, bool retestCounts = true, string? partNumber = null)
    {
        ArgumentNullException.ThrowIfNull(store);
        var template = Samples.Released(partNumber ?? Samples.UniquePart());
        await store.Catalog.RegisterAsync(template, Samples.Engineer);
        if (retests is not null)
        {
            await store.Catalog.SetRetestPolicyAsync(template.PartNumber, retests, retestCounts, Samples.Engineer);
        }
        string station = Samples.UniqueStation();
        await store.Stations.RegisterStationAsync(station, "VNA bench", Samples.Engineer);
        LotSummary lot = await store.Lots.CreateLotAsync(
            new NewLot(Samples.UniqueLot(), template.PartNumber, null, Samples.Supplier, quantity, plan)
            {
                SupplierLot = "VPZ-88412",
                DateCode = "2544",
                PurchaseOrder = "PO-7731",
                Customer = "Brackwater Shipyards",
            }, Samples.Engineer);
        return new PreparedLot(template, station, lot);
    }
}
