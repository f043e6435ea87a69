using System.Security.Cryptography;
using System.Text;

namespace FilterQA.Core.Templates;

/// <summary>The content hash of a canonical template text.</summary>
internal static class TemplateHash
{
    /// <summary>Prefix naming the algorithm, so a later change of algorithm is visible in the files.</summary>
    internal const string Prefix = "sha256:";

    /// <summary>"sha256:" + lower-case hex SHA-256 of the UTF-8 bytes (no byte-order mark).</summary>
    internal static string Of(string canonicalText) =>
        Prefix + Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(canonicalText)));
}
