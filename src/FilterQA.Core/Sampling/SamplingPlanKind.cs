namespace FilterQA.Core.Sampling;

/// <summary>How a sampling plan was chosen.</summary>
public enum SamplingPlanKind
{
    /// <summary>From the MIL-STD-105E single-sampling tables (Table I letter, Table II-A/B/C plan).</summary>
    Mil105ESingle,

    /// <summary>A zero-acceptance (c = 0) plan sized for a stated LTPD and confidence.</summary>
    ZeroAcceptance,

    /// <summary>Every unit of the lot is inspected, chosen as such by the user.</summary>
    FullInspection,
}
