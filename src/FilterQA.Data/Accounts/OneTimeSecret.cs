using System.Globalization;
using System.Security.Cryptography;

namespace FilterQA.Data.Accounts;

/// <summary>Random one-time passwords and PINs: for the accounts made at first start and on the accounts page.</summary>
public static class OneTimeSecret
{
    // Letters and digits that cannot be mistaken for one another when read off a screen (no I, l, O, 0, 1).
    private const string Upper = "ABCDEFGHJKLMNPQRSTUVWXYZ";
    private const string Lower = "abcdefghijkmnopqrstuvwxyz";
    private const string Digits = "23456789";

    /// <summary>
    /// Four groups of upper, lower, digit, lower joined by '-' (19 characters, about 67 bits), so every
    /// password meets Identity's rules (length 10, each character class, a non-alphanumeric).
    /// </summary>
    public static string Password() => string.Join('-', Enumerable.Range(0, 4).Select(_ =>
        string.Concat(RandomNumberGenerator.GetString(Upper, 1), RandomNumberGenerator.GetString(Lower, 1),
            RandomNumberGenerator.GetString(Digits, 1), RandomNumberGenerator.GetString(Lower, 1))));

    /// <summary>A six-digit PIN, leading zeros allowed.</summary>
    public static string Pin() => RandomNumberGenerator.GetInt32(0, 1_000_000).ToString("D6", CultureInfo.InvariantCulture);
}
