using System.Globalization;
using System.Text.RegularExpressions;

namespace FilterQA.Core.Templates;

/// <summary>
/// Validation shared by the template model: each check throws an <see cref="ArgumentException"/> whose
/// message is a plain sentence (the template reader shows it to the quality engineer beside the line).
/// </summary>
internal static partial class Checks
{
    /// <summary>A finite value above zero.</summary>
    internal static double Positive(double value, string what)
    {
        if (!double.IsFinite(value) || value <= 0)
        {
            throw new ArgumentException(Say($"{what} must be a finite number above zero; got {value:R}"));
        }
        return value;
    }

    /// <summary>A finite value of zero or more.</summary>
    internal static double NonNegative(double value, string what)
    {
        if (!double.IsFinite(value) || value < 0)
        {
            throw new ArgumentException(Say($"{what} must be a finite number of zero or more; got {value:R}"));
        }
        return value;
    }

    /// <summary>Any finite value.</summary>
    internal static double Finite(double value, string what)
    {
        if (!double.IsFinite(value))
        {
            throw new ArgumentException(Say($"{what} must be a finite number; got {value:R}"));
        }
        return value;
    }

    /// <summary>A defined enum member.</summary>
    internal static T Defined<T>(T value, string what) where T : struct, Enum
    {
        if (!Enum.IsDefined(value))
        {
            throw new ArgumentException(Say($"{what} has no meaning for the value {value}"));
        }
        return value;
    }

    /// <summary>A rule id: a short name of lower-case letters, digits and hyphens, starting with a letter, at most 32 characters.</summary>
    internal static string RuleId(string? id)
    {
        if (id is null || !RuleIdPattern().IsMatch(id))
        {
            throw new ArgumentException(Say($"rule id '{id}' is not a short name: use 1 to 32 lower-case letters, digits or hyphens, starting with a letter"));
        }
        return id;
    }

    /// <summary>A non-empty single-line text without leading or trailing blanks.</summary>
    internal static string Text(string? text, string what)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            throw new ArgumentException(Say($"{what} must not be empty"));
        }
        if (text.Contains('\n', StringComparison.Ordinal) || text.Contains('\r', StringComparison.Ordinal))
        {
            throw new ArgumentException(Say($"{what} must be one line"));
        }
        if (text.Trim().Length != text.Length)
        {
            throw new ArgumentException(Say($"{what} must not start or end with blanks"));
        }
        return text;
    }

    internal static string Say(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);

    [GeneratedRegex("^[a-z][a-z0-9-]{0,31}$", RegexOptions.CultureInvariant)]
    internal static partial Regex RuleIdPattern();

    [GeneratedRegex("^[A-Za-z0-9][A-Za-z0-9._/-]{0,39}$", RegexOptions.CultureInvariant)]
    internal static partial Regex PartNumberPattern();
}
