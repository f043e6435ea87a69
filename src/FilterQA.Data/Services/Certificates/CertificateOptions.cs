namespace FilterQA.Data.Services.Certificates;

/// <summary>
/// The "Certificates" configuration section: who issues certificates, how their numbers look and
/// where the public verification page is. Issuing is refused until the issuer name and the public
/// base URL are set.
/// </summary>
public sealed class CertificateOptions
{
    /// <summary>Configuration section name.</summary>
    public const string Section = "Certificates";

    /// <summary>The statement printed when none is configured.</summary>
    public const string DefaultStatement =
        "The lot named above was sampled and inspected against the limit template revision shown, and the sample met the acceptance "
        + "criteria of the sampling plan stated. The lot is therefore declared to conform to that template.";

    /// <summary>The issuing company's name, printed in the heading.</summary>
    public string? IssuerName { get; set; }

    /// <summary>The issuer's address, one printed line each.</summary>
    public IList<string> IssuerAddressLines { get; } = [];

    /// <summary>The start of every certificate number, e.g. "TME-COC" gives TME-COC-2026-000017.</summary>
    public string NumberPrefix { get; set; } = "COC";

    /// <summary>The address people outside reach this application at, e.g. https://qc.example; the verification link is this plus /verify.</summary>
    public string? PublicBaseUrl { get; set; }

    /// <summary>The statement of conformance printed above the signature.</summary>
    public string Statement { get; set; } = DefaultStatement;
}
