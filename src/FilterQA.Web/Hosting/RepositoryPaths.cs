namespace FilterQA.Web.Hosting;

/// <summary>
/// Where the host finds the repository's folders when it runs from a clone (web root, demo templates),
/// and where it looks when it runs from a publish folder.
/// </summary>
public static class RepositoryPaths
{
    /// <summary>The file that marks the repository root.</summary>
    public const string SolutionFile = "FilterQA.sln";

    /// <summary>
    /// Host options with the web root set: the repository's top-level wwwroot/ when the host runs from a
    /// clone (found by walking up from the current folder, then from the application's folder), else the
    /// wwwroot/ a publish puts beside the application.
    /// </summary>
    public static WebApplicationOptions HostOptions(string[] args)
    {
        string? root = FindRoot(Directory.GetCurrentDirectory()) ?? FindRoot(AppContext.BaseDirectory);
        string webRoot = root is not null && Directory.Exists(Path.Combine(root, "wwwroot"))
            ? Path.Combine(root, "wwwroot")
            : Path.Combine(AppContext.BaseDirectory, "wwwroot");
        return new WebApplicationOptions { Args = args, WebRootPath = webRoot };
    }

    /// <summary>The nearest folder at or above <paramref name="start"/> holding <see cref="SolutionFile"/>, or null.</summary>
    public static string? FindRoot(string start)
    {
        var directory = new DirectoryInfo(start);
        while (directory is not null && !File.Exists(Path.Combine(directory.FullName, SolutionFile)))
        {
            directory = directory.Parent;
        }
        return directory?.FullName;
    }

    /// <summary>
    /// The demo templates folder: <paramref name="configured"/> when given (relative to the content root),
    /// else limit-templates/ of the repository above the content root, else limit-templates/ beside the application.
    /// </summary>
    public static string TemplatesFolder(string? configured, string contentRoot)
    {
        if (!string.IsNullOrWhiteSpace(configured))
        {
            return Path.GetFullPath(Path.Combine(contentRoot, configured));
        }
        string? root = FindRoot(contentRoot) ?? FindRoot(AppContext.BaseDirectory);
        return root is not null ? Path.Combine(root, "limit-templates") : Path.Combine(AppContext.BaseDirectory, "limit-templates");
    }
}
