using System.Security.Claims;
using FilterQA.Data.Accounts;

namespace FilterQA.Web.Ui.Layout;

/// <summary>The frame of every screen: who is signed in and in which role, "Switch operator", and the navigation.</summary>
public partial class MainLayout
{
    // Role names as the top bar shows them, in the order RoleNames lists the roles.
    private static readonly Dictionary<string, string> RoleWords = new(StringComparer.Ordinal)
    {
        [RoleNames.Operator] = "operator",
        [RoleNames.QualityEngineer] = "quality engineer",
        [RoleNames.Approver] = "approver",
        [RoleNames.Administrator] = "administrator",
    };

    internal static string RoleText(ClaimsPrincipal user)
    {
        string[] roles = RoleNames.All.Where(user.IsInRole).Select(r => RoleWords[r]).ToArray();
        return roles.Length == 0 ? "no role" : string.Join(", ", roles);
    }
}
