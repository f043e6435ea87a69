using System.Reflection;

namespace FilterQA.Web.Components;

/// <summary>
/// The Razor class libraries whose pages the host serves, beside its own. The router (Routes.razor) and
/// the endpoint mapping both read this list, so a page library is added in this one place.
/// </summary>
public static class PageAssemblies
{
    /// <summary>Page libraries other than the host's own assembly.</summary>
    public static Assembly[] Additional { get; } =
    [
        typeof(FilterQA.Web.Ui.UiAssembly).Assembly,
    ];
}
