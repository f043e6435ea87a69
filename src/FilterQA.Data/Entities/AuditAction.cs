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
}
