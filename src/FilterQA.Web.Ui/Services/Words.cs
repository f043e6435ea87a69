using System.Globalization;
using FilterQA.Core.Decisions;
using FilterQA.Core.Sampling;
using FilterQA.Data.Entities;

namespace FilterQA.Web.Ui.Services;

/// <summary>Plain words for enums and numbers on the screens (invariant culture throughout).</summary>
public static class Words
{
    public static string Verdict(UnitVerdict verdict) => verdict switch
    {
        UnitVerdict.Go => "GO",
        UnitVerdict.NoGo => "NO-GO",
        _ => "NOT VERIFIABLE",
    };

    public static string Outcome(RuleOutcome outcome) => outcome switch
    {
        RuleOutcome.Pass => "passes",
        RuleOutcome.ConditionalPass => "passes within the uncertainty",
        RuleOutcome.ConditionalFail => "fails within the uncertainty",
        RuleOutcome.Fail => "fails",
        _ => "cannot be verified",
    };

    public static string Status(LotStatus status) => status switch
    {
        LotStatus.Open => "Open",
        LotStatus.InTest => "In test",
        LotStatus.Held => "On hold",
        LotStatus.Accepted => "Accepted",
        _ => "Rejected",
    };

    public static string Decision(LotDecision decision) => decision switch
    {
        LotDecision.Pending => "Sample not complete",
        LotDecision.Accept => "Accept",
        LotDecision.AcceptReturnToNormal => "Accept (return to normal inspection)",
        LotDecision.Reject => "Reject",
        _ => "Reject (rejection number reached)",
    };

    public static string Percent(double fraction) =>
        double.IsNaN(fraction) ? "—" : (fraction * 100).ToString("0.0", CultureInfo.InvariantCulture) + " %";

    public static string Number(double value, string format = "0.###") =>
        double.IsFinite(value) ? value.ToString(format, CultureInfo.InvariantCulture) : "—";

    public static string Time(DateTimeOffset at) => at.ToUniversalTime().ToString("yyyy-MM-dd HH:mm 'UTC'", CultureInfo.InvariantCulture);

    /// <summary>A service's message as a sentence: first letter upper case, a full stop at the end.</summary>
    public static string Sentence(string message)
    {
        ArgumentNullException.ThrowIfNull(message);
        string text = message.Trim();
        if (text.Length == 0)
        {
            return text;
        }
        text = char.ToUpperInvariant(text[0]) + text[1..];
        return text.EndsWith('.') ? text : text + ".";
    }
}
