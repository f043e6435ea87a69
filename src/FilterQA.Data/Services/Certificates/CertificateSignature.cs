namespace FilterQA.Data.Services.Certificates;

/// <summary>Who signed the certificate in the app, in which role, when (UTC) and why.</summary>
public sealed record CertificateSignature(string SignerName, string SignerRole, DateTimeOffset SignedAt, string Reason);
