using FilterQA.Core.Decisions;
using FilterQA.Core.Synthesis;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Text;

namespace FilterQA.Core.Tests.Decisions;

// A consistency check of the shipped demo templates, the engine and the synthesiser together: good synthetic units
// of each part are go, and each defect kind is caught by the rule it is meant to break. The synthetic numbers are
// demo data, so nothing here checks the correctness of a value; that is done on hand-built traces elsewhere.
public class DemoTemplateConsistencyTests
{
    private static LimitTemplate Template(string partNumber)
    {
        TemplateReadResult read = LimitTemplateReader.ReadFile(RepositoryFiles.Template(partNumber));
        Assert.True(read.Succeeded, string.Join("\n", read.Problems));
        return read.Template!;
    }

    private static string Describe(UnitEvaluation evaluation) =>
        evaluation.Verdict + ": " + string.Join(" | ", evaluation.Rules.Select(r => $"{r.RuleId} {r.Outcome} {r.Message}"));

    public static TheoryData<string, ulong> GoodUnits()
    {
        var data = new TheoryData<string, ulong>();
        foreach (DemoPart part in DemoParts.All)
        {
            foreach (ulong seed in new ulong[] { 1, 2544, 90210 })
            {
                data.Add(part.PartNumber, seed);
            }
        }
        return data;
    }

    [Theory]
    [MemberData(nameof(GoodUnits))]
    public void Good_units_of_every_demo_part_are_go(string partNumber, ulong seed)
    {
        LimitTemplate template = Template(partNumber);
        DemoPart part = DemoParts.Get(partNumber);
        var synthesiser = new UnitSynthesiser(seed);
        foreach (int serial in new[] { 1, 2, 3, 17 })
        {
            UnitEvaluation evaluation = TemplateEvaluator.Evaluate(template, MeasurementInput.FromSweep(synthesiser.Unit(part, serial), thruAge: TimeSpan.FromHours(1)));
            Assert.True(evaluation.Verdict == UnitVerdict.Go, $"{partNumber} seed {seed} serial {serial}: {Describe(evaluation)}");
        }
    }

    public static TheoryData<string, DefectKind, string> Defects() => new()
    {
        { "TME-CF455-15", DefectKind.CentreDrift, "centre" },
        { "TME-CF455-15", DefectKind.LowRejection, "reject-" },
        { "TME-CF455-15", DefectKind.HighLoss, "loss" },
        { "TME-XF21M4-15", DefectKind.LowRejection, "reject-" },
        { "TME-XF21M4-15", DefectKind.StrongUnwantedMode, "spurious" },
        { "TME-XF21M4-15", DefectKind.HighLoss, "loss" },
        { "TME-SF70M-1M2", DefectKind.LowRejection, "reject-" },
        { "TME-SF70M-1M2", DefectKind.HighLoss, "loss" },
        { "TME-SF162-AIS", DefectKind.LowRejection, "reject-" },
        { "TME-SF162-AIS", DefectKind.HighLoss, "loss" },
        { "TME-XR24M-18", DefectKind.CentreDrift, "fs" },
        { "TME-XR24M-18", DefectKind.StrongUnwantedMode, "unwanted-modes" },
        { "TME-XR24M-18", DefectKind.HighLoss, "r1" },
        { "TME-LC92-TRAP", DefectKind.CentreDrift, "notch" },
        { "TME-LC92-TRAP", DefectKind.LowRejection, "depth" },
        { "TME-LC92-TRAP", DefectKind.HighLoss, "loss-" },
    };

    [Fact]
    public void Every_defect_kind_of_every_demo_part_is_listed_here()
    {
        var listed = Defects().Select(row => ((string)row[0], (DefectKind)row[1])).ToHashSet();
        foreach (DemoPart part in DemoParts.All)
        {
            foreach (DefectKind defect in part.Defects)
            {
                Assert.Contains((part.PartNumber, defect), listed);
            }
        }
    }

    [Theory]
    [MemberData(nameof(Defects))]
    public void Each_defect_is_no_go_for_the_rule_it_breaks(string partNumber, DefectKind defect, string ruleIdPrefix)
    {
        LimitTemplate template = Template(partNumber);
        DemoPart part = DemoParts.Get(partNumber);
        foreach ((ulong seed, int serial) in new[] { (1UL, 1), (2544UL, 5), (90210UL, 12) })
        {
            UnitEvaluation evaluation = TemplateEvaluator.Evaluate(template,
                MeasurementInput.FromSweep(new UnitSynthesiser(seed).Unit(part, serial, defect), thruAge: TimeSpan.FromHours(1)));
            Assert.True(evaluation.Verdict == UnitVerdict.NoGo, $"{partNumber} {defect} seed {seed}: {Describe(evaluation)}");
            Assert.True(evaluation.BlockingRules.Any(r => r.RuleId.StartsWith(ruleIdPrefix, StringComparison.Ordinal)
                    && r.Outcome is RuleOutcome.Fail or RuleOutcome.ConditionalFail),
                $"{partNumber} {defect} seed {seed}: expected a failing rule '{ruleIdPrefix}…': {Describe(evaluation)}");
        }
    }
}
