namespace FilterQA.Data.Services.Certificates;

/// <summary>A certificate was not issued (nothing was stored); the message says why in words a person can act on.</summary>
public sealed class CertificateRefusedException : InvalidOperationException
{
    public CertificateRefusedException(CertificateRefusal refusal, string message)
        : base(message)
    {
        Refusal = refusal;
    }

    public CertificateRefusedException()
    {
    }

    public CertificateRefusedException(string message)
        : base(message)
    {
    }

    public CertificateRefusedException(string message, Exception innerException)
        : base(message, innerException)
    {
    }

    /// <summary>The kind of refusal.</summary>
    public CertificateRefusal Refusal { get; }
}
