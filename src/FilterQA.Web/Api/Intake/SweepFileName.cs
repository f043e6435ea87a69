using System.Text.RegularExpressions;

namespace FilterQA.Web.Api.Intake;

/// <summary>
/// Checks a sweep file name given by a caller or found in a watched folder before it is used for anything:
/// a plain name (no folder part, no "..", no control characters), at most 160 characters, of letters,
/// digits and ". _ - + ( )" and spaces, with an extension a reader knows.
/// </summary>
public static partial class SweepFileName
{
    /// <summary>Longest name accepted, characters.</summary>
    public const int MaxLength = 160;

    /// <summary>Null when <paramref name="name"/> is acceptable, else why not (the name itself is not repeated).</summary>
    public static string? Problem(string? name)
    {
        if (string.IsNullOrEmpty(name))
        {
            return "the file name is empty";
        }
        if (name.Length > MaxLength)
        {
            return FormattableString.Invariant($"the file name is {name.Length} characters long; at most {MaxLength} are allowed");
        }
        if (name.Any(char.IsControl))
        {
            return "the file name contains control characters";
        }
        if (name.Contains('/', StringComparison.Ordinal) || name.Contains('\\', StringComparison.Ordinal) || name.Contains(':', StringComparison.Ordinal))
        {
            return "the file name contains a folder separator; give a plain name";
        }
        if (name.Contains("..", StringComparison.Ordinal) || name.StartsWith('.') || name.EndsWith(' '))
        {
            return "the file name starts with '.', contains '..' or ends with a space";
        }
        if (!Allowed().IsMatch(name))
        {
            return "the file name may hold only letters, digits, spaces and . _ - + ( )";
        }
        if (!KnownExtension().IsMatch(name))
        {
            return "the file name must end in a sweep extension: .s1p … .s99p, .ts, .csv, .tsv, .txt or .dat";
        }
        return null;
    }

    [GeneratedRegex(@"^[A-Za-z0-9 ._+()\-]+$", RegexOptions.CultureInvariant)]
    private static partial Regex Allowed();

    [GeneratedRegex(@"\.(s\d{1,2}p|ts|csv|tsv|txt|dat)$", RegexOptions.IgnoreCase | RegexOptions.CultureInvariant)]
    private static partial Regex KnownExtension();
}
