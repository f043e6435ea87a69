using System.Collections.Concurrent;
using SkiaSharp;

namespace FilterQA.Reports.Pdf;

/// <summary>
/// The fonts of the documents, loaded from font files by path (Debian's fonts-dejavu-core by
/// default): one <see cref="SKTypeface"/> per face for the life of the process, because every new
/// typeface object is embedded again in a PDF (about 220 KB a face).
/// </summary>
public sealed class ReportFonts
{
    /// <summary>The family name under which the charts ask ScottPlot for these faces.</summary>
    public const string ChartFamily = "FilterQA Report Sans";

    private static readonly string[] DefaultFolders =
    [
        "/usr/share/fonts/truetype/dejavu",
        "/usr/share/fonts/dejavu",
        "/usr/share/fonts/TTF",
        "/usr/share/fonts",
        "/usr/local/share/fonts",
    ];

    private static readonly ConcurrentDictionary<string, ReportFonts> Loaded = new(StringComparer.Ordinal);

    private ReportFonts(string regularPath, string boldPath, string monoPath)
    {
        RegularPath = regularPath;
        BoldPath = boldPath;
        MonoPath = monoPath;
        Regular = Open(regularPath);
        Bold = Open(boldPath);
        Mono = Open(monoPath);
    }

    /// <summary>DejaVu Sans.</summary>
    public SKTypeface Regular { get; }

    /// <summary>DejaVu Sans Bold.</summary>
    public SKTypeface Bold { get; }

    /// <summary>DejaVu Sans Mono.</summary>
    public SKTypeface Mono { get; }

    public string RegularPath { get; }

    public string BoldPath { get; }

    public string MonoPath { get; }

    /// <summary>The typeface of <paramref name="face"/>.</summary>
    public SKTypeface Typeface(FontFace face) => face switch
    {
        FontFace.Bold => Bold,
        FontFace.Mono => Mono,
        _ => Regular,
    };

    /// <summary>
    /// The fonts from <paramref name="folder"/> (searched with its subfolders) when given, else from the
    /// usual font folders of a Linux system. Loaded once per folder and reused.
    /// </summary>
    /// <exception cref="ReportFontsMissingException">DejaVuSans.ttf, DejaVuSans-Bold.ttf or DejaVuSansMono.ttf is in none of the folders searched; the message names them.</exception>
    public static ReportFonts Load(string? folder = null)
    {
        string[] folders = string.IsNullOrWhiteSpace(folder) ? DefaultFolders : [Path.GetFullPath(folder)];
        string key = string.Join('|', folders);
        if (Loaded.TryGetValue(key, out ReportFonts? known))
        {
            return known;
        }
        var searched = new List<string>();
        string? regular = Find(folders, "DejaVuSans.ttf", searched);
        string? bold = Find(folders, "DejaVuSans-Bold.ttf", searched);
        string? mono = Find(folders, "DejaVuSansMono.ttf", searched);
        if (regular is null || bold is null || mono is null)
        {
            var missing = new List<string>();
            if (regular is null)
            {
                missing.Add("DejaVuSans.ttf");
            }
            if (bold is null)
            {
                missing.Add("DejaVuSans-Bold.ttf");
            }
            if (mono is null)
            {
                missing.Add("DejaVuSansMono.ttf");
            }
            throw new ReportFontsMissingException(
                $"the document fonts {string.Join(", ", missing)} were not found; searched {string.Join(", ", folders)} and their subfolders " +
                "(install Debian's fonts-dejavu-core, or set Reports:FontFolder to a folder holding these files)", searched);
        }
        return Loaded.GetOrAdd(key, _ => new ReportFonts(regular, bold, mono));
    }

    private static string? Find(string[] folders, string fileName, List<string> searched)
    {
        foreach (string folder in folders)
        {
            searched.Add(Path.Combine(folder, fileName));
            if (!Directory.Exists(folder))
            {
                continue;
            }
            string direct = Path.Combine(folder, fileName);
            if (File.Exists(direct))
            {
                return direct;
            }
            try
            {
                string? found = Directory.EnumerateFiles(folder, fileName, new EnumerationOptions { RecurseSubdirectories = true, IgnoreInaccessible = true, MaxRecursionDepth = 4 })
                    .Order(StringComparer.Ordinal).FirstOrDefault();
                if (found is not null)
                {
                    return found;
                }
            }
            catch (IOException)
            {
                // A folder that vanished while being searched holds no font; the next one is tried.
            }
        }
        return null;
    }

    private static SKTypeface Open(string path) =>
        SKTypeface.FromFile(path) ?? throw new ReportFontsMissingException($"the font file {path} exists but cannot be read as a font", [path]);
}
