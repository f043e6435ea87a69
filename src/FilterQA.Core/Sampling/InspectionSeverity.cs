namespace FilterQA.Core.Sampling;

/// <summary>Severity of inspection selected by the switching rules: picks Table II-A, II-B or II-C.</summary>
public enum InspectionSeverity
{
    /// <summary>Normal inspection (Table II-A); where inspection starts.</summary>
    Normal,

    /// <summary>Tightened inspection (Table II-B): same sample sizes, smaller acceptance numbers.</summary>
    Tightened,

    /// <summary>Reduced inspection (Table II-C, as in MIL-STD-105E): smaller samples.</summary>
    Reduced,
}
