using FilterQA.Data.Accounts;
using FilterQA.Data.Entities;
using FilterQA.Data.Services;
using FilterQA.Data.Services.Certificates;
using FilterQA.Web.Ui.Services;
using Microsoft.AspNetCore.Components;
using Microsoft.AspNetCore.Components.Authorization;

namespace FilterQA.Web.Ui.Components;

/// <summary>
/// A lot's documents on its page: for an accepted lot its certificate (number, digest, download) or, for an
/// approver, the signing form with a reason and a confirm step; for a rejected lot the rejection report; always
/// the yield report and the three exports. The paper choice applies to every PDF link.
/// </summary>
public partial class LotDocuments
{
    [Inject]
    private LotDocumentsModel Model { get; set; } = null!;

    [CascadingParameter]
    private Task<AuthenticationState>? AuthenticationState { get; set; }

    /// <summary>The lot's summary (required).</summary>
    [Parameter, EditorRequired]
    public LotSummary Summary { get; set; } = null!;

    /// <summary>Called after a certificate is newly signed, so the page around it can show the lot's record as final.</summary>
    [Parameter]
    public EventCallback OnSigned { get; set; }

    private IssuedCertificate? Certificate { get; set; }

    private string Paper { get; set; } = "a4";

    private string PaperName => Paper == "letter" ? "Letter" : "A4";

    private string? Reason { get; set; }

    private bool Confirming { get; set; }

    private bool Busy { get; set; }

    private string? Problem { get; set; }

    private string? Done { get; set; }

    private string SignerName { get; set; } = "";

    // After-render runs only once the circuit is live, so this tells a browser test the buttons answer.
    private bool Live { get; set; }

    protected override async Task OnParametersSetAsync()
    {
        Certificate = Summary.Status == LotStatus.Accepted ? await Model.CertificateAsync(Summary.LotNumber).ConfigureAwait(true) : null;
    }

    protected override void OnAfterRender(bool firstRender)
    {
        if (firstRender)
        {
            Live = true;
            StateHasChanged();
        }
    }

    private string Href(string path) => LotDocumentsModel.Link(Summary.LotNumber, path);

    private async Task AskToConfirm()
    {
        (Problem, Done) = (null, null);
        if (string.IsNullOrWhiteSpace(Reason))
        {
            Problem = "Give the reason for signing the certificate.";
            return;
        }
        Actor? actor = await ActorAsync().ConfigureAwait(true);
        if (actor is not { IsApprover: true })
        {
            Problem = "Only an approver signs certificates.";
            return;
        }
        SignerName = actor.Name;
        Confirming = true;
    }

    private void Cancel() => Confirming = false;

    private async Task SignAsync()
    {
        Actor? actor = await ActorAsync().ConfigureAwait(true);
        if (actor is null)
        {
            Problem = "Sign in again to sign the certificate.";
            return;
        }
        Busy = true;
        try
        {
            (IssuedCertificate? certificate, string? problem) = await Model.SignAsync(Summary.LotNumber, Reason, actor).ConfigureAwait(true);
            Confirming = false;
            if (certificate is not null)
            {
                Certificate = certificate;
                Done = certificate.NewlyIssued
                    ? $"Certificate {certificate.CertificateNumber} is signed."
                    : $"This lot already had certificate {certificate.CertificateNumber}; nothing new was issued.";
                Reason = null;
                if (certificate.NewlyIssued)
                {
                    await OnSigned.InvokeAsync().ConfigureAwait(true);
                }
            }
            else
            {
                Problem = problem;
            }
        }
        finally
        {
            Busy = false;
        }
    }

    private async Task<Actor?> ActorAsync() =>
        AuthenticationState is null ? null : ActorClaims.TryFromClaims((await AuthenticationState.ConfigureAwait(true)).User);
}
