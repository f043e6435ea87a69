namespace FilterQA.Data.Services.Certificates;

/// <summary>The sampling plan the lot was decided by, as printed (level, severity and code letter as the standard writes them).</summary>
public sealed record CertificatePlan(
    string Standard,
    string? InspectionLevel,
    string? Severity,
    double? AqlPercent,
    string? CodeLetter,
    int SampleSize,
    int AcceptanceNumber,
    int RejectionNumber,
    bool IsFullInspection);
