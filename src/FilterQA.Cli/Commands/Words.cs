using FilterQA.Core.Decisions;
using FilterQA.Core.Sampling;
using FilterQA.Data.Entities;

namespace FilterQA.Cli.Commands;

/// <summary>How the storage commands write verdicts, decisions and states: lower-case words, the same in text and JSON.</summary>
internal static class Words
{
    public static string Verdict(UnitVerdict verdict) => verdict switch
    {
        UnitVerdict.Go => "go",
        UnitVerdict.NoGo => "no-go",
        _ => "not verifiable",
    };

    public static string Decision(LotDecision decision) => decision switch
    {
        LotDecision.Pending => "pending",
        LotDecision.Accept => "accept",
        LotDecision.AcceptReturnToNormal => "accept (return to normal)",
        LotDecision.Reject => "reject",
        _ => "reject (decided early)",
    };

    public static string Status(LotStatus status) => status switch
    {
        LotStatus.Open => "open",
        LotStatus.InTest => "in test",
        LotStatus.Held => "held",
        LotStatus.Accepted => "accepted",
        _ => "rejected",
    };

    /// <summary>A fraction 0..1 as a percentage with one decimal, or "n/a" for NaN (no unit).</summary>
    public static string Percent(double fraction) =>
        double.IsNaN(fraction) ? "n/a" : (fraction * 100).ToString("0.0", System.Globalization.CultureInfo.InvariantCulture) + " %";
}
