using FilterQA.Data.Entities;

namespace FilterQA.Web.Ui.Services;

/// <summary>Plain words for the audit actions on the audit page.</summary>
public static class AuditWords
{
    /// <summary>The action as a short phrase, e.g. "lot held".</summary>
    public static string Action(AuditAction action) => action switch
    {
        AuditAction.PartRegistered => "part registered",
        AuditAction.RetestPolicyChanged => "retest policy changed",
        AuditAction.TemplateRegistered => "template revision stored",
        AuditAction.TemplateReleased => "template revision released",
        AuditAction.TemplateWithdrawn => "template revision withdrawn",
        AuditAction.StationRegistered => "station registered",
        AuditAction.ThruRecorded => "thru recorded",
        AuditAction.LotCreated => "lot registered",
        AuditAction.LotTemplateChanged => "lot's template revision changed",
        AuditAction.UnitRetested => "unit retested",
        AuditAction.LotHeld => "lot held",
        AuditAction.LotHoldReleased => "hold released",
        AuditAction.LotDispositioned => "lot decided by the plan",
        AuditAction.LotDispositionOverridden => "lot decided against the plan",
        AuditAction.ApiKeyCreated => "station key made",
        AuditAction.ApiKeyRevoked => "station key revoked",
        // Actions added later by other changes still show, by their name.
        _ => action.ToString(),
    };
}
