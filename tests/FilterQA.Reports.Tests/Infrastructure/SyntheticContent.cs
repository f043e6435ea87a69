using FilterQA.Core.Templates;
using System.Collections.Immutable;
using FilterQA.Core.Decisions;
using FilterQA.Core.Statistics;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Synthesis;
using FilterQA.Data.Services.Certificates;
using FilterQA.Reports.Charts;
using FilterQA.Reports.Documents;

namespace FilterQA.Reports.Tests.Infrastructure;

/// <summary>Content for the renderers made in the test, from the invented demo scenario (no database).</summary>
public static class SyntheticContent
{
    public static readonly DateTimeOffset Signed = new(2026, 11, 4, 14, 32, 5, TimeSpan.Zero);

    public static CertificateSnapshot Certificate() => new(
        "TME-COC-2026-00042",
        new CertificateIssuer("Tarnwell Marine Electronics", ["Incoming inspection", "Quay Road 14", "Tarnwell"]),
        "Brackwater Shipyards",
        "PO-7731",
        "VP-2611-0042",
        "TME-CF455-15",
        "455 kHz ceramic IF filter, 15 kHz bandwidth",
        3,
        "9f2c4e1a7b3d5f60a1c2e3f4051627384950a6b7c8d9e0f1a2b3c4d5e6f70819",
        "Veltrane Piezo",
        "VPZ-88412",
        "2544",
        2000,
        125,
        new CertificatePlan("MIL-STD-105E", "II", "normal", 0.65, "K", 125, 2, 3, false),
        new CertificateResult(125, 124, 1, "accepted"),
        [
            new CertificateParameter("insertion-loss", "dB", 125, 5.21, 5.734, 6.48, null, 7.0),
            new CertificateParameter("bandwidth-6db", "Hz", 125, 14120, 15034.5, 15870, 13500, 16500),
            new CertificateParameter("centre-frequency", "Hz", 125, 454610, 455012.3, 455390, 453000, 457000),
            new CertificateParameter("stopband-rejection", "dB", 125, 41.2, 47.83, 55.1, 40, null),
            new CertificateParameter("group-delay-variation", "s", 125, 1.2e-6, 2.35e-6, 3.9e-6, null, 5e-6),
        ],
        "The units tested conform to the part's released limit template; the lot was accepted by the sampling plan shown.",
        new CertificateSignature("S. Petrova", "approver", Signed, "lot accepted by the plan"),
        "3b8f0c2d9e4a17b65c0d3e2f1a4b5c6d7e8f90123456789abcdef0123456789a",
        "https://filterqa.tarnwell.example/verify?number=TME-COC-2026-00042&digest=3b8f0c2d9e4a17b65c0d3e2f1a4b5c6d7e8f90123456789abcdef0123456789a");

    public static LotHeader Lot(string lotNumber = "VP-2611-0042", string status = "Rejected") => new(lotNumber, "TME-CF455-15",
        "455 kHz ceramic IF filter", 3, "9f2c4e1a7b3d5f60a1c2e3f4051627384950a6b7c8d9e0f1a2b3c4d5e6f70819", "Veltrane Piezo", "VPZ-88412", "2544",
        "PO-7731", "Brackwater Shipyards", 2000, status, new DateTimeOffset(2026, 11, 3, 8, 0, 0, TimeSpan.Zero),
        new CertificatePlan("MIL-STD-105E", "II", "normal", 0.65, "K", 125, 2, 3, false));

    public static RuleLine Failing(string rule, double measured, double limit, LimitSense sense = LimitSense.AtMost, string unit = "dB") =>
        new(rule, rule.Replace('-', ' '), unit, measured, limit, sense, sense == LimitSense.AtMost ? limit - measured : measured - limit, RuleOutcome.Fail, true);

    public static IReadOnlyList<NonConformingUnit> FailingUnits(int count, string lotNumber = "VP-2611-0042")
    {
        var units = new List<NonConformingUnit>(count);
        for (int i = 0; i < count; i++)
        {
            var rules = new List<RuleLine> { Failing("insertion-loss", 7.1 + 0.01 * i, 7.0) };
            if (i % 3 == 0)
            {
                rules.Add(Failing("stopband-rejection", 38.5 - 0.1 * (i % 10), 40, LimitSense.AtLeast));
            }
            units.Add(new NonConformingUnit(lotNumber, UnitSynthesiser.Serial(i + 1), 1, "no-go", rules));
        }
        return units;
    }

    public static RejectionReportContent Rejection(int failing = 4)
    {
        IReadOnlyList<NonConformingUnit> units = FailingUnits(failing);
        ParetoChart pareto = ParetoChart.FromFailures(units.SelectMany(u => u.FailingRules).Select(r => r.RuleId));
        return new RejectionReportContent(Lot(), 125, failing, "Reject", "S. Petrova", Signed,
            $"Reject by the plan: {failing} defectives in 125 tested (n 125, Ac 2, Re 3)", false, units, pareto.Entries, new ReportStamp("J. Lindqvist", Signed));
    }

    /// <summary>A yield report of <paramref name="units"/> synthesised units of the 455 kHz demo filter, defects at <paramref name="defectShare"/>.</summary>
    public static YieldReportContent Yield(int units, double defectShare = 0.05, int lots = 2)
    {
        ResponseTrace[] sweeps = Sweeps(units, defectShare);
        var rows = new List<LotYieldRow>();
        int perLot = units / lots;
        for (int l = 0; l < lots; l++)
        {
            int tested = l == lots - 1 ? units - perLot * (lots - 1) : perLot;
            int firstGo = tested - (int)Math.Round(tested * defectShare * 1.2);
            int finalGo = tested - (int)Math.Round(tested * defectShare);
            rows.Add(new LotYieldRow($"VP-2611-{42 + l:0000}", "Veltrane Piezo", new DateTimeOffset(2026, 11, 3 + l, 8, 0, 0, TimeSpan.Zero), "Accepted", tested, firstGo, finalGo));
        }
        int nonConforming = units - rows.Sum(r => r.FinalGo);
        IReadOnlyList<NonConformingUnit> failing = FailingUnits(nonConforming);
        ParetoChart pareto = ParetoChart.FromFailures(failing.SelectMany(u => u.FailingRules).Select(r => r.RuleId));
        var random = new Random(7);
        double[] loss = Enumerable.Range(0, units).Select(_ => 5.7 + 0.25 * Normal(random)).ToArray();
        double[] bandwidth = Enumerable.Range(0, units).Select(_ => 15000 + 300 * Normal(random)).ToArray();
        double[] centre = Enumerable.Range(0, units).Select(_ => 455000 + 250 * Normal(random)).ToArray();
        ParameterSummary[] parameters =
        [
            ParameterSummary.Compute("insertion-loss", "dB", loss, new SpecLimits(null, 7.0)),
            ParameterSummary.Compute("bandwidth-6db", "Hz", bandwidth, new SpecLimits(13500, 16500)),
            ParameterSummary.Compute("centre-frequency", "Hz", centre, new SpecLimits(453000, 457000)),
        ];
        MaskLine[] mask =
        [
            new("passband-loss", LimitBoundary.Upper, ImmutableArray.Create(448000.0, 462000.0), ImmutableArray.Create(9.0, 9.0)),
            new("stopband-low", LimitBoundary.Lower, ImmutableArray.Create(255000.0, 355000.0), ImmutableArray.Create(40.0, 40.0)),
            new("stopband-high", LimitBoundary.Lower, ImmutableArray.Create(555000.0, 655000.0), ImmutableArray.Create(40.0, 40.0)),
        ];
        return new YieldReportContent(lots == 1 ? "lot VP-2611-0042" : "2026-11-01 to 2026-11-30", "TME-CF455-15", "455 kHz ceramic IF filter", rows, pareto.Entries,
            parameters, EnvelopeBuilder.Build(sweeps), [sweeps[0], sweeps[^1]], mask, "Limit lines as for unit S0001.", failing, new ReportStamp("J. Lindqvist", Signed));
    }

    /// <summary>Counted sweeps of <paramref name="units"/> synthesised units of the 455 kHz demo filter (seeded, repeatable).</summary>
    public static ResponseTrace[] Sweeps(int units, double defectShare = 0.05) =>
        new UnitSynthesiser(20261103).Lot(DemoParts.Get("TME-CF455-15"), units, defectShare).Select(u => ResponseTrace.Primary(u.Sweep)).ToArray();

    public static UnitReportContent Unit()
    {
        DemoPart part = DemoParts.Get("TME-CF455-15");
        ResponseTrace sweep = ResponseTrace.Primary(new UnitSynthesiser(20261103).Unit(part, 7));
        YieldReportContent yield = Yield(4, 0, 1);
        RuleLine[] rules =
        [
            new("insertion-loss", "Least loss in the passband", "dB", 5.83, 7.0, LimitSense.AtMost, 1.17, RuleOutcome.Pass, false),
            new("bandwidth-6db", "Bandwidth at 6 dB", "Hz", 15120, 13500, LimitSense.AtLeast, 1620, RuleOutcome.Pass, false),
            new("stopband-rejection", "Rejection 255-355 kHz", "dB", 38.4, 40, LimitSense.AtLeast, -1.6, RuleOutcome.Fail, true),
        ];
        return new UnitReportContent(1234, "VP-2611-0042", "TME-CF455-15", 3, "S0007", 1, true, "no-go", "IQC-1", "R. Haldane",
            new DateTimeOffset(2026, 11, 3, 9, 12, 44, TimeSpan.Zero), "no thru (network sweep taken as calibrated)", "VP-2611-0042__S0007.s2p",
            "5d41402abc4b2a76b9719d911017c592aaf0c6b1b2a76b9719d911017c592aaf", sweep, yield.Mask, rules, [], new ReportStamp("R. Haldane", Signed));
    }

    private static double Normal(Random random)
    {
        double u1 = 1 - random.NextDouble(), u2 = random.NextDouble();
        return Math.Sqrt(-2 * Math.Log(u1)) * Math.Cos(2 * Math.PI * u2); // Box–Muller
    }
}
