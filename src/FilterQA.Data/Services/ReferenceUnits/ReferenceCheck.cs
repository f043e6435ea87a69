using System.Globalization;
using FilterQA.Core.Decisions;

namespace FilterQA.Data.Services;

/// <summary>
/// A draft template judged against every current reference unit of its part. The draft may be released only when
/// there is at least one reference unit and every one of them is go under the draft (<see cref="Passed"/>).
/// </summary>
/// <param name="PartNumber">The part.</param>
/// <param name="Revision">The draft's revision.</param>
/// <param name="ContentHash">The draft's content hash the check was made with.</param>
/// <param name="Units">Each reference unit's result, by lot and serial.</param>
public sealed record ReferenceCheck(string PartNumber, int Revision, string ContentHash, IReadOnlyList<ReferenceCheckUnit> Units)
{
    /// <summary>At least one reference unit, and every one passes.</summary>
    public bool Passed => Units.Count > 0 && Units.All(u => u.Passes);

    /// <summary>The units the draft does not pass.</summary>
    public IEnumerable<ReferenceCheckUnit> Failing => Units.Where(u => !u.Passes);

    /// <summary>One sentence: the outcome, naming each failing unit and its failing rules.</summary>
    public string Summary
    {
        get
        {
            if (Units.Count == 0)
            {
                return $"{PartNumber} has no reference units; mark at least one known-good unit before releasing";
            }
            ReferenceCheckUnit[] failing = Failing.ToArray();
            if (failing.Length == 0)
            {
                return string.Create(CultureInfo.InvariantCulture, $"all {Units.Count} reference unit(s) of {PartNumber} pass revision {Revision}");
            }
            string names = string.Join("; ", failing.Select(u =>
                $"{u.Serial} of lot {u.LotNumber} is {Word(u.Verdict)} (" + (u.FailingRules.Count == 0 ? string.Join(", ", u.Warnings) : string.Join(", ", u.FailingRules.Select(r => r.RuleId))) + ")"));
            return string.Create(CultureInfo.InvariantCulture, $"{failing.Length} of {Units.Count} reference unit(s) of {PartNumber} fail revision {Revision}: {names}");
        }
    }

    private static string Word(UnitVerdict verdict) => verdict switch
    {
        UnitVerdict.Go => "go",
        UnitVerdict.NoGo => "no-go",
        _ => "not verifiable",
    };
}
