namespace FilterQA.Web.Ui;

/// <summary>Marks this assembly so the host can add its pages to the router (<c>typeof(UiAssembly).Assembly</c>).</summary>
public static class UiAssembly
{
}
