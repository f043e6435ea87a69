using System.Collections.Immutable;
using System.Globalization;
using BenchmarkDotNet.Attributes;
using FilterQA.Core.Decisions;
using FilterQA.Core.Statistics;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Synthesis;
using FilterQA.Core.Templates;
using FilterQA.Data.Services.Certificates;
using FilterQA.Reports.Charts;
using FilterQA.Reports.Documents;
using FilterQA.Reports.Pdf;

namespace FilterQA.Benchmarks;

/// <summary>
/// PDF documents from synthetic content (no database): the yield report of a 10,000-unit lot (target at most 5 s; the
/// overlay is an envelope of all sweeps plus three lines, the unit list about 500 rows) and a certificate (target at most 0.5 s).
/// </summary>
[MemoryDiagnoser]
public class ReportBenchmarks
{
    private const int Units = 10_000;
    private readonly ReportFonts _fonts = ReportFonts.Load();
    private YieldReportContent _yield = null!;
    private ResponseTrace[] _sweeps = [];
    private CertificateSnapshot _certificate = null!;

    [GlobalSetup]
    public void Setup()
    {
        DemoPart part = DemoParts.Get("TME-CF455-15");
        var synthesiser = new UnitSynthesiser(2611);
        ResponseTrace[] sweeps = synthesiser.Lot(part, Units, 0.05).Select(u => ResponseTrace.Primary(u.Sweep)).ToArray();
        _sweeps = sweeps;
        var random = new Random(42);
        double[] Values(double mean, double sigma) => Enumerable.Range(0, Units).Select(_ =>
            mean + sigma * Math.Sqrt(-2 * Math.Log(1 - random.NextDouble())) * Math.Cos(2 * Math.PI * random.NextDouble())).ToArray();
        ParameterSummary[] parameters =
        [
            ParameterSummary.Compute("loss", "dB", Values(4.1, 0.3), new SpecLimits(null, 6)),
            ParameterSummary.Compute("bw-6db", "Hz", Values(19800, 150), new SpecLimits(15000, null)),
            ParameterSummary.Compute("centre", "Hz", Values(455000, 300), new SpecLimits(453500, 456500)),
            ParameterSummary.Compute("reject-low", "dB", Values(58, 3), new SpecLimits(35, null)),
        ];
        var failing = new List<NonConformingUnit>();
        for (int i = 0; i < Units / 20; i++)
        {
            failing.Add(new NonConformingUnit("VP-2611-0042", UnitSynthesiser.Serial(20 * i + 1), 1, "no-go",
            [
                new RuleLine("loss", "Least loss in the passband", "dB", 6.2 + 0.001 * i, 6, LimitSense.AtMost, -0.2, RuleOutcome.Fail, true),
            ]));
        }
        ParetoChart pareto = ParetoChart.FromCounts([new("loss", failing.Count), new("centre", 120), new("reject-low", 40)]);
        MaskLine[] mask =
        [
            new("reject-low", LimitBoundary.Lower, ImmutableArray.Create(255e3, 355e3), ImmutableArray.Create(35.0, 35.0)),
            new("reject-high", LimitBoundary.Lower, ImmutableArray.Create(555e3, 655e3), ImmutableArray.Create(35.0, 35.0)),
        ];
        var stamp = new ReportStamp("J. Lindqvist", new DateTimeOffset(2026, 11, 4, 9, 0, 0, TimeSpan.Zero));
        _yield = new YieldReportContent("lot VP-2611-0042", "TME-CF455-15", "455 kHz ceramic IF filter",
            [new LotYieldRow("VP-2611-0042", "Veltrane Piezo", stamp.GeneratedAt, "Accepted", Units, Units - failing.Count - 60, Units - failing.Count)],
            pareto.Entries, parameters, LossEnvelope.Empty, [sweeps[0], sweeps[Units / 2], sweeps[^1]], mask, "Limit lines as for the first unit.", failing, stamp);
        _certificate = new CertificateSnapshot("TME-COC-2026-00042", new CertificateIssuer("Tarnwell Marine Electronics", ["Incoming inspection", "Quay Road 14"]),
            "Brackwater Shipyards", "PO-7731", "VP-2611-0042", "TME-CF455-15", "455 kHz ceramic IF filter", 3, new string('a', 64), "Veltrane Piezo",
            "VPZ-88412", "2544", 2000, 125, new CertificatePlan("MIL-STD-105E", "II", "normal", 0.65, "K", 125, 2, 3, false),
            new CertificateResult(125, 125, 0, "accepted"),
            parameters.Select(p => new CertificateParameter(p.Parameter, p.Unit, p.Moments.Count, p.Moments.Minimum, p.Moments.Mean, p.Moments.Maximum,
                p.Limits?.Lower, p.Limits?.Upper)).ToArray(),
            "The units tested conform to the released limit template.", new CertificateSignature("S. Petrova", "approver", stamp.GeneratedAt, "accepted by the plan"),
            new string('b', 64), "https://filterqa.tarnwell.example/verify?number=TME-COC-2026-00042&digest=" + new string('b', 64));
    }

    [Benchmark]
    public long YieldReport10000Units()
    {
        // The envelope of all 10,000 sweeps is part of the cost, as it is when the report is made from storage.
        YieldReportContent content = _yield with { Envelope = EnvelopeBuilder.Build(_sweeps) };
        using var stream = new MemoryStream();
        new YieldReportDocument(_fonts).Render(content, PaperSize.A4, stream);
        return stream.Length;
    }

    [Benchmark]
    public long Certificate()
    {
        using var stream = new MemoryStream();
        new CertificateDocument(_fonts).Render(_certificate, PaperSize.A4, stream);
        return stream.Length;
    }

    public override string ToString() => string.Create(CultureInfo.InvariantCulture, $"{Units} units");
}
