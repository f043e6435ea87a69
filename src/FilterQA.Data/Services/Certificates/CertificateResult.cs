namespace FilterQA.Data.Services.Certificates;

/// <summary>The sample's outcome: units tested, how many conformed, and the lot decision in words.</summary>
public sealed record CertificateResult(int UnitsTested, int UnitsConforming, int UnitsNonConforming, string Decision);
