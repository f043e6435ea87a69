using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;

namespace FilterQA.Web.Ui.Tests.Infrastructure;

/// <summary>Draft revisions of the shipped 455 kHz template for what-if tests (invented changes).</summary>
public static class Drafts
{
    /// <summary>
    /// The next revision with the centre tolerance widened to ±4 kHz (a unit drifted by 3 kHz now passes) and the
    /// 6 dB bandwidth minimum raised to 19 kHz (about half of units of 19 kHz nominal now fail).
    /// </summary>
    public static LimitTemplate WiderCentreNarrowerBandwidth(LimitTemplate released) => released.NewRevision(editor =>
    {
        for (int i = 0; i < editor.Rules.Count; i++)
        {
            editor.Rules[i] = editor.Rules[i] switch
            {
                CentreFrequencyRule c => new CentreFrequencyRule(c.Id, "Centre frequency 455.0 kHz ±4 kHz (draft)", c.LevelDb,
                    new FrequencyTolerance(4e3, ToleranceUnit.Hertz), c.Method, c.Uncertainty),
                BandwidthRule { Id: "bw-6db" } b => new BandwidthRule(b.Id, "6 dB bandwidth at least 19 kHz (draft)", b.LevelDb, 19e3, b.MaximumHz, b.Uncertainty),
                var other => other,
            };
        }
    });
}
