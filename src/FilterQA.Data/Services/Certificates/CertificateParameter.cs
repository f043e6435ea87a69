namespace FilterQA.Data.Services.Certificates;

/// <summary>
/// One key parameter's spread over the counted units (minimum, mean, maximum) beside its limits;
/// a missing limit is one-sided. Values in the SI unit or dB named by <paramref name="Unit"/>.
/// </summary>
public sealed record CertificateParameter(
    string Parameter,
    string Unit,
    int Count,
    double Minimum,
    double Mean,
    double Maximum,
    double? LowerLimit,
    double? UpperLimit);
