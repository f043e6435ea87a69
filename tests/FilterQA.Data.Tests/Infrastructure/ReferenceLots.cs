using FilterQA.Core.Synthesis;
using FilterQA.Data.Services;

namespace FilterQA.Data.Tests.Infrastructure;

/// <summary>A lot of demo 455 kHz filter units stored through the intake, to pick reference units from.</summary>
public static class ReferenceLots
{
    /// <summary>
    /// A new part (released revision 1, the shipped TME-CF455-15 rules) with a lot of <paramref name="units"/> demo units;
    /// the serial indices in <paramref name="highLoss"/> are built with the high-loss defect.
    /// </summary>
    public static async Task<PreparedLot> StoreAsync(TestStore store, int units = 4, params int[] highLoss)
    {
        ArgumentNullException.ThrowIfNull(store);
        PreparedLot lot = await store.PrepareLotAsync(PlanRequest.FullInspection(), quantity: units);
        for (int i = 1; i <= units; i++)
        {
            DefectKind defect = highLoss.Contains(i) ? DefectKind.HighLoss : DefectKind.None;
            await store.Intake.SubmitAsync(DemoFiles.Submission(lot, UnitSynthesiser.Serial(i), DemoFiles.NetworkUnit(i, defect)));
        }
        return lot;
    }

    /// <summary>Marks the first measurement of each serial as a reference unit.</summary>
    public static async Task<IReadOnlyList<ReferenceUnitInfo>> MarkAsync(TestStore store, PreparedLot lot, params string[] serials)
    {
        ArgumentNullException.ThrowIfNull(store);
        ArgumentNullException.ThrowIfNull(lot);
        IReadOnlyList<ReferenceCandidate> candidates = await store.ReferenceUnits.CandidatesAsync(lot.PartNumber, lot.LotNumber);
        var marked = new List<ReferenceUnitInfo>();
        foreach (string serial in serials)
        {
            ReferenceCandidate candidate = candidates.Single(c => c.Serial == serial && c.Attempt == 1);
            marked.Add(await store.ReferenceUnits.AddAsync(lot.PartNumber, candidate.MeasurementId, "cross-checked on a second analyser", Samples.Engineer));
        }
        return marked;
    }
}
