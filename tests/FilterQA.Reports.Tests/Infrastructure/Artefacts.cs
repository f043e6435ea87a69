using System.Diagnostics;

namespace FilterQA.Reports.Tests.Infrastructure;

/// <summary>Where rendered documents and their PNG previews are kept for people to look at.</summary>
public static class Artefacts
{
    public static string Folder
    {
        get
        {
            var directory = new DirectoryInfo(AppContext.BaseDirectory);
            while (directory is not null && !File.Exists(Path.Combine(directory.FullName, "FilterQA.sln")))
            {
                directory = directory.Parent;
            }
            string root = directory?.FullName ?? throw new InvalidOperationException("FilterQA.sln not found above the test binaries");
            string folder = Path.Combine(root, "tests", "TestResults", "documents");
            Directory.CreateDirectory(folder);
            return folder;
        }
    }

    public static string? PdfToPpm() =>
        new[] { "/usr/bin/pdftoppm", "/usr/local/bin/pdftoppm" }.FirstOrDefault(File.Exists);

    /// <summary>Renders every page of <paramref name="pdfPath"/> to PNG at 80 dpi beside it; returns the PNG files.</summary>
    public static IReadOnlyList<string> ToPng(string pdfTool, string pdfPath)
    {
        string prefix = Path.Combine(Path.GetDirectoryName(pdfPath)!, Path.GetFileNameWithoutExtension(pdfPath));
        foreach (string old in Directory.GetFiles(Path.GetDirectoryName(pdfPath)!, Path.GetFileName(prefix) + "-*.png"))
        {
            File.Delete(old);
        }
        using var process = Process.Start(new ProcessStartInfo(pdfTool, ["-png", "-r", "80", pdfPath, prefix]) { RedirectStandardError = true })
            ?? throw new InvalidOperationException("pdftoppm did not start");
        string error = process.StandardError.ReadToEnd();
        process.WaitForExit();
        if (process.ExitCode != 0)
        {
            throw new InvalidOperationException($"pdftoppm failed with exit code {process.ExitCode}: {error}");
        }
        return Directory.GetFiles(Path.GetDirectoryName(pdfPath)!, Path.GetFileName(prefix) + "-*.png").Order(StringComparer.Ordinal).ToArray();
    }
}
