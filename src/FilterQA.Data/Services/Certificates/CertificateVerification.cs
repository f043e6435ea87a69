namespace FilterQA.Data.Services.Certificates;

/// <summary>The answer to a verification: the outcome, and the certificate's public facts only when it is <see cref="CertificateVerificationOutcome.Valid"/>.</summary>
public sealed record CertificateVerification(CertificateVerificationOutcome Outcome, VerifiedCertificate? Certificate)
{
    public bool IsValid => Outcome == CertificateVerificationOutcome.Valid;
}
