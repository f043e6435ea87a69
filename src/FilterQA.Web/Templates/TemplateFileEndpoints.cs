using System.Globalization;
using System.Text;
using FilterQA.Data;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using FilterQA.Web.Accounts;
using Microsoft.AspNetCore.Http.HttpResults;

namespace FilterQA.Web.Templates;

/// <summary>GET /templates/{PartNumber}/{Revision}/file: a stored template revision's text as a download.</summary>
public static class TemplateFileEndpoints
{
    /// <summary>The media type of the text format (YAML, RFC 9512).</summary>
    public const string ContentType = "application/yaml; charset=utf-8";

    /// <summary>Maps the endpoint: signed-in quality engineers, approvers and administrators (not operators, not stations).</summary>
    public static IEndpointRouteBuilder MapTemplateFileEndpoints(this IEndpointRouteBuilder app)
    {
        ArgumentNullException.ThrowIfNull(app);
        app.MapGet("/templates/{partNumber}/{revision:int}/file", GetFileAsync)
            .RequireAuthorization(policy => policy.RequireAuthenticatedUser()
                .RequireAssertion(c => !c.User.HasClaim(claim => claim.Type == ActorClaims.Station))
                .RequireRole(RoleNames.QualityEngineer, RoleNames.Approver, RoleNames.Administrator))
            .ExcludeFromDescription();
        return app;
    }

    /// <summary>The file name a download gets: the part number (characters unsafe in a file name replaced by '_') and the revision.</summary>
    public static string FileName(string partNumber, int revision)
    {
        ArgumentNullException.ThrowIfNull(partNumber);
        var safe = new StringBuilder(partNumber.Length);
        foreach (char c in partNumber)
        {
            safe.Append(char.IsAsciiLetterOrDigit(c) || c is '-' or '_' or '.' ? c : '_');
        }
        return string.Create(CultureInfo.InvariantCulture, $"{safe}-rev{revision}.yaml");
    }

    private static async Task<Results<FileContentHttpResult, ProblemHttpResult>> GetFileAsync(string partNumber, int revision, TemplateCatalog catalog,
        CancellationToken cancellationToken)
    {
        try
        {
            StoredTemplateText stored = await catalog.LoadTextAsync(partNumber, revision, cancellationToken).ConfigureAwait(false);
            return TypedResults.File(new UTF8Encoding(false).GetBytes(stored.Text), ContentType, FileName(partNumber, revision));
        }
        catch (RecordNotFoundException e)
        {
            return TypedResults.Problem(statusCode: StatusCodes.Status404NotFound, title: "No such template revision", detail: e.Message);
        }
    }
}
