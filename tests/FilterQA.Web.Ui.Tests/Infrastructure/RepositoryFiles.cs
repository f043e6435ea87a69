namespace FilterQA.Web.Ui.Tests.Infrastructure;

/// <summary>Files shipped with the repository, found by walking up to FilterQA.sln.</summary>
internal static class RepositoryFiles
{
    public static string Root()
    {
        var directory = new DirectoryInfo(AppContext.BaseDirectory);
        while (directory is not null && !File.Exists(Path.Combine(directory.FullName, "FilterQA.sln")))
        {
            directory = directory.Parent;
        }
        return directory?.FullName ?? throw new InvalidOperationException("FilterQA.sln not found above the test binaries");
    }

    public static string Template(string partNumber) => Path.Combine(Root(), "limit-templates", partNumber + ".yaml");
}
