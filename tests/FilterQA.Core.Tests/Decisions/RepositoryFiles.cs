namespace FilterQA.Core.Tests.Decisions;

/// <summary>Finds files of the repository (the folder holding FilterQA.sln) from the test's output folder.</summary>
internal static class RepositoryFiles
{
    public static string Root()
    {
        for (DirectoryInfo? dir = new(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "FilterQA.sln")))
            {
                return dir.FullName;
            }
        }
        throw new InvalidOperationException("FilterQA.sln not found above " + AppContext.BaseDirectory);
    }

    public static string Template(string partNumber) => Path.Combine(Root(), "limit-templates", partNumber + ".yaml");
}
