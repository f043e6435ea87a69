namespace FilterQA.Core.Templates;

/// <summary>Life-cycle state of one revision of a template.</summary>
public enum TemplateStatus
{
    /// <summary>Being written; not for deciding lots.</summary>
    Draft,

    /// <summary>Approved for incoming inspection; its content can no longer change (a change makes a new revision).</summary>
    Released,

    /// <summary>Was released, no longer to be used for new lots; kept so old records stay readable.</summary>
    Withdrawn,
}
