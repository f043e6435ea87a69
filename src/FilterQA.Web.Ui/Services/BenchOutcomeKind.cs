namespace FilterQA.Web.Ui.Services;

/// <summary>What became of one sweep file offered at the bench.</summary>
public enum BenchOutcomeKind
{
    /// <summary>Stored and judged; the verdict is in the result.</summary>
    Judged,

    /// <summary>Testing is blocked (no thru, or an expired one); nothing was stored.</summary>
    Refused,

    /// <summary>The file cannot be read; nothing was stored. The message names file, line and column.</summary>
    Unreadable,

    /// <summary>The lot, station or unit does not take this measurement (closed or held lot, sample full, no serial); nothing was stored.</summary>
    NotTaken,

    /// <summary>Not offered, because an earlier file of the same drop was refused.</summary>
    Skipped,
}
