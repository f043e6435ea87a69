using FilterQA.Data.Services.Certificates;
using Microsoft.AspNetCore.Components;

namespace FilterQA.Web.Ui.Pages;

/// <summary>
/// The public verification page (no sign-in). Given a number and a digest it says whether they belong to one
/// issued certificate and shows only that certificate's public facts; any other pair gets the same answer,
/// whether the number exists or not, and never the real digest. Rate-limited by the host.
/// </summary>
public partial class VerifyPage
{
    /// <summary>The host's rate-limit policy for this page.</summary>
    public const string RateLimitPolicy = "verify";

    [Inject]
    private CertificateService Certificates { get; set; } = null!;

    /// <summary>The certificate number from the address.</summary>
    [SupplyParameterFromQuery(Name = "number")]
    public string? Number { get; set; }

    /// <summary>The data digest from the address.</summary>
    [SupplyParameterFromQuery(Name = "digest")]
    public string? Digest { get; set; }

    private CertificateVerification? Result { get; set; }

    protected override async Task OnParametersSetAsync()
    {
        Result = string.IsNullOrWhiteSpace(Number) || string.IsNullOrWhiteSpace(Digest)
            ? null
            : await Certificates.VerifyAsync(Number, Digest).ConfigureAwait(true);
    }
}
