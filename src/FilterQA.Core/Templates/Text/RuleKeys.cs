using System.Collections.Frozen;

namespace FilterQA.Core.Templates.Text;

/// <summary>
/// The fields each rule kind has in the text format, in the order the writer writes them. The reader
/// rejects any other field; a test keeps the published schema in step with this table.
/// </summary>
internal static class RuleKeys
{
    /// <summary>Fields every rule has.</summary>
    internal static readonly IReadOnlyList<string> Common = ["id", "kind", "title"];

    /// <summary>Fields per kind (after the common ones); "uncertainty" comes last for every kind.</summary>
    internal static readonly FrozenDictionary<RuleKind, string[]> ByKind = new Dictionary<RuleKind, string[]>
    {
        [RuleKind.CentreFrequency] = ["level", "method", "tolerance"],
        [RuleKind.Bandwidth] = ["level", "minimum", "maximum"],
        [RuleKind.InsertionLoss] = ["measure", "anchor", "at", "maximum"],
        [RuleKind.PassbandRipple] = ["anchor", "start", "stop", "maximum"],
        [RuleKind.StopbandRejection] = ["anchor", "start", "stop", "reference", "minimum"],
        [RuleKind.ShapeFactor] = ["pass-level", "stop-level", "maximum"],
        [RuleKind.SpuriousResponse] = ["anchor", "start", "stop", "minimum"],
        [RuleKind.GroupDelayVariation] = ["anchor", "start", "stop", "aperture", "maximum"],
        [RuleKind.ReturnLoss] = ["port", "anchor", "start", "stop", "minimum"],
        [RuleKind.SeriesResonance] = ["tolerance"],
        [RuleKind.MotionalResistance] = ["maximum"],
        [RuleKind.ShuntCapacitance] = ["maximum"],
        [RuleKind.UnloadedQ] = ["minimum"],
        [RuleKind.UnwantedModes] = ["anchor", "start", "stop", "minimum"],
        [RuleKind.NotchFrequency] = ["tolerance"],
        [RuleKind.NotchDepth] = ["reference", "minimum"],
        [RuleKind.LimitLine] = ["boundary", "anchor", "reference", "points"],
    }.ToFrozenDictionary();

    /// <summary>Every field a rule of <paramref name="kind"/> may have, in writing order.</summary>
    internal static IReadOnlyList<string> AllFor(RuleKind kind) => [.. Common, .. ByKind[kind], "uncertainty"];

    /// <summary>Top-level fields, in writing order.</summary>
    internal static readonly IReadOnlyList<string> TopLevel =
    [
        "format-version", "part", "revision", "description", "device", "nominal", "status", "author",
        "release-date", "content-hash", "decision-rule", "sweep", "rules",
    ];

    /// <summary>Fields of the sweep section, in writing order.</summary>
    internal static readonly IReadOnlyList<string> Sweep =
    [
        "start", "stop", "narrowest-feature", "points-per-feature", "max-thru-age", "needs-phase", "needs-s11", "needs-s22",
    ];
}
