namespace FilterQA.Web.Ui.Services;

/// <summary>
/// The unit serial a sweep file's name carries when many files are dropped at once: the name without
/// folder and extension, and when it holds underscores, the part after the last one
/// ("TME-CF455-15_S0001.s2p" → "S0001", "S0002.csv" → "S0002").
/// </summary>
public static class SerialFromFileName
{
    /// <summary>The serial, or null when the name leaves nothing usable.</summary>
    public static string? Extract(string fileName)
    {
        ArgumentNullException.ThrowIfNull(fileName);
        string stem = Path.GetFileNameWithoutExtension(fileName.Replace('\\', '/').Split('/')[^1]).Trim();
        int underscore = stem.LastIndexOf('_');
        string serial = underscore >= 0 ? stem[(underscore + 1)..].Trim() : stem;
        return serial.Length == 0 ? null : serial;
    }
}
