using System.Security.Cryptography;

namespace FilterQA.Web.Setup;

/// <summary>Random one-time passwords and PINs for first start.</summary>
internal static class Secrets
{
    private const string Upper = "ABCDEFGHJKLMNPQRSTUVWXYZ";
    private const string Lower = "abcdefghijkmnopqrstuvwxyz";
    private const string Digits = "23456789";

    /// <summary>Four groups like "Kt7m" joined by '-': upper, lower, digit and a separator in every password (about 67 bits).</summary>
    public static string Password() => string.Join('-', Enumerable.Range(0, 4).Select(_ =>
        string.Concat(RandomNumberGenerator.GetString(Upper, 1), RandomNumberGenerator.GetString(Lower, 1),
            RandomNumberGenerator.GetString(Digits, 1), RandomNumberGenerator.GetString(Lower, 1))));

    /// <summary>A six-digit PIN, leading zeros allowed.</summary>
    public static string Pin() => RandomNumberGenerator.GetInt32(0, 1_000_000).ToString("D6", System.Globalization.CultureInfo.InvariantCulture);
}
