namespace FilterQA.Data.Services.Certificates;

/// <summary>What a number and digest pair is.</summary>
public enum CertificateVerificationOutcome
{
    /// <summary>A certificate with this number exists and its digest is the one given.</summary>
    Valid,

    /// <summary>No certificate has this number.</summary>
    UnknownNumber,

    /// <summary>A certificate has this number, but not this digest.</summary>
    DigestMismatch,
}
