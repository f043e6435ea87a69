using System.Numerics;
using System.Runtime.InteropServices;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Synthesis;

namespace FilterQA.Core.Tests.Synthesis;

// The synthesiser's own contract: seeded, deterministic, independent per unit. Nothing here is a
// correctness reference for the engine.
public class SynthesisDeterminismTests
{
    public static TheoryData<string> PartNumbers()
    {
        var data = new TheoryData<string>();
        foreach (DemoPart part in DemoParts.All)
        {
            data.Add(part.PartNumber);
        }
        return data;
    }

    private static byte[] Bytes(Sweep sweep)
    {
        NetworkData network = sweep.Network!;
        var all = new List<byte>();
        foreach ((int to, int from) in new[] { (1, 1), (1, 2), (2, 1), (2, 2) })
        {
            all.AddRange(MemoryMarshal.AsBytes(network.Trace(to, from)).ToArray());
        }
        return [.. all];
    }

    [Theory]
    [MemberData(nameof(PartNumbers))]
    public void Same_seed_part_and_serial_give_the_same_bytes_from_separate_instances(string partNumber)
    {
        DemoPart part = DemoParts.Get(partNumber);
        Sweep first = new UnitSynthesiser(2544).Unit(part, 17);
        Sweep second = new UnitSynthesiser(2544).Unit(part, 17);
        Assert.Equal(Bytes(first), Bytes(second)); // exact: determinism means bit for bit
        Assert.Equal(first.Source.FileName, second.Source.FileName);
    }

    [Fact]
    public void A_unit_does_not_depend_on_what_was_generated_before()
    {
        DemoPart part = DemoParts.Get("TME-CF455-15");
        var fresh = new UnitSynthesiser(7);
        Sweep alone = fresh.Unit(part, 5, DefectKind.LowRejection);

        var busy = new UnitSynthesiser(7);
        for (int i = 1; i <= 4; i++)
        {
            busy.Unit(part, i);
            busy.Unit(DemoParts.Get("TME-XR24M-18"), i, DefectKind.StrongUnwantedMode);
            busy.PowerThru(part, "IQC-1");
        }
        Assert.Equal(Bytes(alone), Bytes(busy.Unit(part, 5, DefectKind.LowRejection)));
    }

    [Theory]
    [MemberData(nameof(PartNumbers))]
    public void Different_serials_and_different_seeds_give_different_units(string partNumber)
    {
        DemoPart part = DemoParts.Get(partNumber);
        var synthesiser = new UnitSynthesiser(1);
        byte[] unit1 = Bytes(synthesiser.Unit(part, 1));
        Assert.NotEqual(unit1, Bytes(synthesiser.Unit(part, 2)));
        Assert.NotEqual(unit1, Bytes(new UnitSynthesiser(2).Unit(part, 1)));
    }

    [Fact]
    public void Unit_sweeps_are_synthetic_two_ports_named_after_part_and_serial()
    {
        DemoPart part = DemoParts.Get("TME-SF70M-1M2");
        Sweep sweep = new UnitSynthesiser(3).Unit(part, 42);
        Assert.Equal("TME-SF70M-1M2_S0042.s2p", sweep.Source.FileName);
        Assert.Equal(SweepFormat.Synthetic, sweep.Source.Format);
        Assert.Equal(2, sweep.Network!.PortCount);
        Assert.Same(part.Grid, sweep.Grid);
        // Reciprocal: S12 is S21 exactly.
        Assert.True(sweep.Network.Trace(1, 2).SequenceEqual(sweep.Network.Trace(2, 1)));
    }

    [Fact]
    public void Lot_has_the_rounded_number_of_defects_of_the_requested_kinds_and_repeats_exactly()
    {
        DemoPart part = DemoParts.Get("TME-CF455-15");
        var synthesiser = new UnitSynthesiser(11);
        List<SyntheticUnit> lot = [.. synthesiser.Lot(part, 50, 0.05, [DefectKind.CentreDrift], firstSerialIndex: 101)];

        Assert.Equal(50, lot.Count);
        Assert.Equal(Enumerable.Range(101, 50), lot.Select(u => u.SerialIndex));
        Assert.Equal("S0101", lot[0].Serial);
        // round(50 × 0.05) = round(2.5) = 3, half away from zero.
        Assert.Equal(3, lot.Count(u => u.Defect == DefectKind.CentreDrift));
        Assert.Equal(47, lot.Count(u => u.Defect == DefectKind.None));

        List<SyntheticUnit> again = [.. new UnitSynthesiser(11).Lot(part, 50, 0.05, [DefectKind.CentreDrift], firstSerialIndex: 101)];
        Assert.Equal(lot.Select(u => u.Defect), again.Select(u => u.Defect));
        SyntheticUnit defective = lot.First(u => u.Defect != DefectKind.None);
        Assert.Equal(Bytes(defective.Sweep), Bytes(synthesiser.Unit(part, defective.SerialIndex, defective.Defect)));
    }

    [Fact]
    public void Bad_arguments_are_refused_with_the_reason()
    {
        var synthesiser = new UnitSynthesiser(1);
        DemoPart crystalFilter = DemoParts.Get("TME-XF21M4-15");
        ArgumentException drift = Assert.Throws<ArgumentException>(() => synthesiser.Unit(crystalFilter, 1, DefectKind.CentreDrift));
        Assert.Contains("TME-XF21M4-15", drift.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentOutOfRangeException>(() => synthesiser.Unit(crystalFilter, 0));
        Assert.Throws<ArgumentOutOfRangeException>(() => synthesiser.Lot(crystalFilter, 10, double.NaN));
        Assert.Throws<ArgumentOutOfRangeException>(() => synthesiser.Lot(crystalFilter, 10, 1.5));
        Assert.Throws<ArgumentException>(() => synthesiser.Lot(crystalFilter, 10, 0.1, [DefectKind.None]));
        Assert.Throws<ArgumentException>(() => synthesiser.PowerThru(crystalFilter, " "));
        ArgumentException unknown = Assert.Throws<ArgumentException>(() => DemoParts.Get("TME-NOPE"));
        Assert.Contains("TME-CF455-15", unknown.Message, StringComparison.Ordinal);
    }
}
