namespace FilterQA.Data.Entities;

/// <summary>What an audit entry records.</summary>
public enum AuditAction
{
    PartRegistered,
    RetestPolicyChanged,
    TemplateRegistered,
    TemplateReleased,
    TemplateWithdrawn,
    StationRegistered,
    ThruRecorded,
    LotCreated,
    LotTemplateChanged,
    UnitRetested,
    LotHeld,
    LotHoldReleased,
    LotDispositioned,
    LotDispositionOverridden,

    /// <summary>A station API key was made (its hash stored; the key shown once).</summary>
    ApiKeyCreated,

    /// <summary>A station API key was revoked.</summary>
    ApiKeyRevoked,

    /// <summary>An approver signed a certificate of conformance for an accepted lot.</summary>
    CertificateIssued,

    /// <summary>A draft template's text was saved from the editor (its new content hash recorded).</summary>
    TemplateDraftSaved,

    /// <summary>A stored measurement was marked as a reference (known-good) unit of its part.</summary>
    ReferenceUnitAdded,

    /// <summary>A reference unit was taken out of its part's reference set.</summary>
    ReferenceUnitRemoved,
}
