using FilterQA.Core.Formats.Delimited;
using FilterQA.Core.Formats.Touchstone;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Synthesis;

namespace FilterQA.Cli.Tests;

/// <summary>A temporary folder of input files for one test, removed afterwards, and an in-process run of the CLI.</summary>
internal sealed class CliFixture : IDisposable
{
    public CliFixture()
    {
        Folder = Directory.CreateTempSubdirectory("filterqa-cli-").FullName;
    }

    public string Folder { get; }

    public static string RepositoryRoot()
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

    public static string ShippedTemplate(string partNumber) => Path.Combine(RepositoryRoot(), "limit-templates", partNumber + ".yaml");

    /// <summary>Writes a synthetic demo unit as a Touchstone file and returns its path.</summary>
    public string Unit(string partNumber, int serial, DefectKind defect = DefectKind.None, ulong seed = 2544)
    {
        Sweep sweep = new UnitSynthesiser(seed).Unit(DemoParts.Get(partNumber), serial, defect);
        return Write(sweep, $"{partNumber}_{serial}_{defect}.s2p");
    }

    public string Write(Sweep sweep, string fileName)
    {
        string path = Path.Combine(Folder, fileName);
        using var writer = new StreamWriter(path);
        TouchstoneWriter.Write(sweep, writer);
        return path;
    }

    /// <summary>Writes a scalar (power or gain) sweep as delimited text and returns its path.</summary>
    public string WriteDelimited(Sweep sweep, string fileName)
    {
        string path = Path.Combine(Folder, fileName);
        using var writer = new StreamWriter(path);
        DelimitedTextWriter.Write(sweep, writer);
        return path;
    }

    public string WriteText(string fileName, string text)
    {
        string path = Path.Combine(Folder, fileName);
        File.WriteAllText(path, text);
        return path;
    }

    public static (int Code, string Out, string Err) Run(params string[] args)
    {
        using var stdout = new StringWriter();
        using var stderr = new StringWriter();
        int code = CliApplication.Run(args, stdout, stderr);
        return (code, stdout.ToString(), stderr.ToString());
    }

    public void Dispose()
    {
        try
        {
            Directory.Delete(Folder, recursive: true);
        }
        catch (IOException)
        {
            // A leftover temp folder is harmless; never fail a test on cleanup.
        }
    }
}
