namespace FilterQA.Data.Services.Certificates;

/// <summary>Why a certificate was not issued.</summary>
public enum CertificateRefusal
{
    /// <summary>The signer is not in the approver role.</summary>
    NotApprover,

    /// <summary>No reason for signing was given.</summary>
    ReasonMissing,

    /// <summary>The lot is not accepted (open, in test, held or rejected).</summary>
    LotNotAccepted,

    /// <summary>The lot already has a certificate, but its stored data no longer has that certificate's digest.</summary>
    DataChanged,
}
