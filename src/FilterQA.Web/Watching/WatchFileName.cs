using System.Text.RegularExpressions;
using FilterQA.Web.Api.Intake;

namespace FilterQA.Web.Watching;

/// <summary>
/// The name of a file dropped in a watched folder: <c>&lt;lotNumber&gt;__&lt;serial&gt;.&lt;ext&gt;</c>, e.g.
/// <c>VP-2611-0042__S0007.s2p</c>. The lot number is letters, digits, '-' and '.'; the serial letters, digits,
/// '-', '.' and '_'; the extension one a sweep reader knows. Files ending in <c>.part</c> are still being written.
/// </summary>
public static partial class WatchFileName
{
    /// <summary>The suffix of a file still being written; such files are left alone until renamed.</summary>
    public const string PartSuffix = ".part";

    /// <summary>The lot and serial named by <paramref name="name"/>, or the reason the name is refused.</summary>
    public static (string? LotNumber, string? Serial, string? Problem) Parse(string name)
    {
        if (SweepFileName.Problem(name) is { } problem)
        {
            return (null, null, problem);
        }
        Match match = Pattern().Match(name);
        return match.Success
            ? (match.Groups["lot"].Value, match.Groups["serial"].Value, null)
            : (null, null, "the name must be <lotNumber>__<serial>.<ext>, e.g. VP-2611-0042__S0007.s2p");
    }

    [GeneratedRegex(@"^(?<lot>[A-Za-z0-9][A-Za-z0-9.\-]{0,63})__(?<serial>[A-Za-z0-9][A-Za-z0-9.\-_]{0,63})\.[A-Za-z0-9]{1,4}$", RegexOptions.CultureInvariant)]
    private static partial Regex Pattern();
}
