using FilterQA.Data;
using FilterQA.Data.Services;
using FilterQA.Data.Services.Certificates;

namespace FilterQA.Web.Ui.Services;

/// <summary>
/// The lot page's documents: reads the lot's certificate and signs it for an approver. The certificate
/// service decides who may sign and when; its refusals become a message for the page.
/// </summary>
public sealed class LotDocumentsModel(CertificateService certificates)
{
    /// <summary>The lot's certificate, or null when none is issued.</summary>
    public Task<IssuedCertificate?> CertificateAsync(string lotNumber, CancellationToken cancellationToken = default) =>
        certificates.GetAsync(lotNumber, cancellationToken);

    /// <summary>Signs the lot's certificate; the result holds the certificate or the reason it was not issued.</summary>
    public async Task<(IssuedCertificate? Certificate, string? Problem)> SignAsync(string lotNumber, string? reason, Actor signer)
    {
        try
        {
            return (await certificates.IssueAsync(lotNumber, reason, signer).ConfigureAwait(false), null);
        }
        catch (Exception e) when (e is CertificateRefusedException or RecordNotFoundException or InvalidOperationException)
        {
            return (null, e.Message);
        }
    }

    /// <summary>The address of a lot's document or export, with the lot number escaped.</summary>
    public static string Link(string lotNumber, string path) => "/lots/" + Uri.EscapeDataString(lotNumber) + "/" + path;
}
