using System.Text.Json;

namespace FilterQA.Data.Services.Certificates;

/// <summary>The stored JSON form of a <see cref="CertificateSnapshot"/> (System.Text.Json, property names as in the record).</summary>
public static class CertificateJson
{
    private static readonly JsonSerializerOptions Options = new() { WriteIndented = false };

    public static string Serialize(CertificateSnapshot snapshot)
    {
        ArgumentNullException.ThrowIfNull(snapshot);
        return JsonSerializer.Serialize(snapshot, Options);
    }

    /// <exception cref="InvalidDataException">The text is not a certificate snapshot.</exception>
    public static CertificateSnapshot Deserialize(string json, string certificateNumber)
    {
        ArgumentNullException.ThrowIfNull(json);
        try
        {
            return JsonSerializer.Deserialize<CertificateSnapshot>(json, Options)
                ?? throw new InvalidDataException($"certificate {certificateNumber}: the stored snapshot is empty");
        }
        catch (JsonException e)
        {
            throw new InvalidDataException($"certificate {certificateNumber}: the stored snapshot does not read ({e.Message})", e);
        }
    }
}
