using System.Reflection;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Tests.Conventions;

/// <summary>
/// FilterQA.Core holds maths, formats, templates and decisions; storage, reports and the web
/// depend on it, never the reverse. These tests fail the build the day Core grows such a reference.
/// </summary>
public sealed class DependencyDirectionTests
{
    private static readonly string[] ForbiddenPrefixes =
    [
        "Microsoft.AspNetCore",
        "Microsoft.EntityFrameworkCore",
        "Microsoft.Data.Sqlite",
        "Npgsql",
        "SkiaSharp",
        "ScottPlot",
        "PdfSharp",
        "QuestPDF",
        "UglyToad.PdfPig",
        "QRCoder",
        "Plotly.Blazor",
        "DocumentFormat.OpenXml",
        "FilterQA.Data",
        "FilterQA.Web",
        "FilterQA.Reports",
        "FilterQA.Cli",
    ];

    [Fact]
    public void Core_references_no_web_database_or_pdf_assembly()
    {
        Assembly core = typeof(Sweep).Assembly;
        string[] offending = core.GetReferencedAssemblies()
            .Select(name => name.Name ?? "")
            .Where(name => ForbiddenPrefixes.Any(prefix => name.StartsWith(prefix, StringComparison.OrdinalIgnoreCase)))
            .ToArray();

        Assert.Empty(offending);
    }

    [Fact]
    public void Core_project_file_has_no_forbidden_package_or_project_reference()
    {
        string project = File.ReadAllText(Path.Combine(RepositoryRoot(), "src", "FilterQA.Core", "FilterQA.Core.csproj"));
        string[] offending = ForbiddenPrefixes.Where(prefix => project.Contains($"\"{prefix}", StringComparison.OrdinalIgnoreCase)
            || project.Contains($"\\{prefix}", StringComparison.OrdinalIgnoreCase)).ToArray();

        Assert.Empty(offending);
    }

    internal static string RepositoryRoot()
    {
        var directory = new DirectoryInfo(AppContext.BaseDirectory);
        while (directory is not null && !File.Exists(Path.Combine(directory.FullName, "FilterQA.sln")))
        {
            directory = directory.Parent;
        }
        return directory?.FullName ?? throw new InvalidOperationException("FilterQA.sln not found above the test binaries");
    }
}
