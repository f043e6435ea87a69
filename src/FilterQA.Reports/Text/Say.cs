using System.Globalization;
using FilterQA.Core.Decisions;
using FilterQA.Core.Sampling;
using FilterQA.Data.Entities;

namespace FilterQA.Reports.Text;

/// <summary>The plain words and number formats every document prints (invariant culture throughout).</summary>
public static class Say
{
    /// <summary>UTC time in ISO 8601, e.g. 2026-11-03T08:00:00Z.</summary>
    public static string Time(DateTimeOffset time) => time.UtcDateTime.ToString("yyyy-MM-dd'T'HH:mm:ss'Z'", CultureInfo.InvariantCulture);

    public static string Date(DateTimeOffset time) => time.UtcDateTime.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture);

    public static string Integer(int value) => value.ToString(CultureInfo.InvariantCulture);

    /// <summary>A fraction 0..1 as a percentage with two decimals, e.g. "97.50 %"; "–" for null or NaN.</summary>
    public static string Percent(double? fraction) =>
        fraction is { } f && double.IsFinite(f) ? (100 * f).ToString("F2", CultureInfo.InvariantCulture) + " %" : "–";

    public static string Fixed(double? value, int decimals) =>
        value is { } v && double.IsFinite(v) ? v.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture) : "–";

    public static string Verdict(UnitVerdict verdict) => verdict switch
    {
        UnitVerdict.Go => "go",
        UnitVerdict.NoGo => "no-go",
        _ => "not verifiable",
    };

    public static string Outcome(RuleOutcome outcome) => outcome switch
    {
        RuleOutcome.Pass => "pass",
        RuleOutcome.ConditionalPass => "conditional pass",
        RuleOutcome.ConditionalFail => "conditional fail",
        RuleOutcome.Fail => "fail",
        _ => "not verifiable",
    };

    /// <summary>"≤" for an upper limit, "≥" for a lower one.</summary>
    public static string Sense(LimitSense sense) => sense == LimitSense.AtMost ? "≤" : "≥";

    /// <summary>A SHA-256 (or any hex) digest in groups of <paramref name="group"/> characters separated by spaces.</summary>
    public static string Grouped(string hex, int group = 8)
    {
        ArgumentNullException.ThrowIfNull(hex);
        var parts = new List<string>();
        for (int i = 0; i < hex.Length; i += group)
        {
            parts.Add(hex.Substring(i, Math.Min(group, hex.Length - i)));
        }
        return string.Join(' ', parts);
    }

    /// <summary>What a sampling plan decided, in words.</summary>
    public static string Decision(LotDecision decision) => decision switch
    {
        LotDecision.Accept => "accept",
        LotDecision.AcceptReturnToNormal => "accept, and return to normal inspection",
        LotDecision.Reject => "reject",
        LotDecision.RejectDecided => "reject (the rejection number was reached before the sample was complete)",
        _ => "pending",
    };

    public static string Status(LotStatus status) => status switch
    {
        LotStatus.Open => "open",
        LotStatus.InTest => "in test",
        LotStatus.Held => "held",
        LotStatus.Accepted => "accepted",
        _ => "rejected",
    };

    public static string OrDash(string? text) => string.IsNullOrWhiteSpace(text) ? "–" : text;
}
