namespace FilterQA.Core.Sampling;

/// <summary>Where the switching rules stand after a history of lots.</summary>
public sealed class SwitchingState
{
    internal SwitchingState(InspectionSeverity severity, bool discontinued, IReadOnlyList<SwitchingEvent> events,
        IReadOnlyList<InspectionSeverity> severityByLot, int consecutiveAccepted, int switchingScore, int rejectedOnTightened, int lotsOnTightened)
    {
        Severity = severity;
        IsDiscontinued = discontinued;
        Events = events;
        SeverityByLot = severityByLot;
        ConsecutiveAccepted = consecutiveAccepted;
        SwitchingScore = switchingScore;
        RejectedOnTightened = rejectedOnTightened;
        LotsOnTightened = lotsOnTightened;
    }

    /// <summary>Severity for the next lot.</summary>
    public InspectionSeverity Severity { get; }

    /// <summary>True when sampling inspection is discontinued: no more lots are accepted under the plan until the supplier has corrected the process; it then resumes on tightened.</summary>
    public bool IsDiscontinued { get; }

    /// <summary>Every severity change, in order.</summary>
    public IReadOnlyList<SwitchingEvent> Events { get; }

    /// <summary>The last change, or null when the history never switched.</summary>
    public SwitchingEvent? LastEvent => Events.Count == 0 ? null : Events[^1];

    /// <summary>Reason for the present state (the last change, or the start).</summary>
    public string Reason => LastEvent?.Reason ?? "start of the history: initial severity";

    /// <summary>Severity each lot of the history was to be inspected at, by index.</summary>
    public IReadOnlyList<InspectionSeverity> SeverityByLot { get; }

    /// <summary>Lots accepted in a row at the present severity (the run ends at a rejection or a switch).</summary>
    public int ConsecutiveAccepted { get; }

    /// <summary>ISO 2859-1 switching score on normal inspection; 0 for the 105E variant or when not on normal.</summary>
    public int SwitchingScore { get; }

    /// <summary>Lots rejected during the present stretch of tightened inspection; 0 when not on tightened.</summary>
    public int RejectedOnTightened { get; }

    /// <summary>Lots inspected during the present stretch of tightened inspection; 0 when not on tightened.</summary>
    public int LotsOnTightened { get; }
}
