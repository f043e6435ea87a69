using FilterQA.Data.Accounts;

namespace FilterQA.Web.Ui.Services;

/// <summary>Who may open the template pages: the editor needs a quality engineer; the lists and the export also admit approvers and administrators.</summary>
public static class TemplateRoles
{
    /// <summary>Roles that may see the template lists and download a template file.</summary>
    public const string Readers = RoleNames.QualityEngineer + "," + RoleNames.Approver + "," + RoleNames.Administrator;

    /// <summary>Roles that may edit, start and import drafts.</summary>
    public const string Editors = RoleNames.QualityEngineer;
}
