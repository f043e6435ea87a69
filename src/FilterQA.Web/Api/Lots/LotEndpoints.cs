using FilterQA.Data;
using FilterQA.Data.Services;
using FilterQA.Web.Accounts;
using FilterQA.Web.Api.Intake;
using Microsoft.AspNetCore.Http.HttpResults;

namespace FilterQA.Web.Api.Lots;

/// <summary>GET /api/v1/lots/{lotNumber}: a lot's progress, for scripts and people alike.</summary>
public static class LotEndpoints
{
    public static RouteGroupBuilder MapLotEndpoints(this RouteGroupBuilder api)
    {
        ArgumentNullException.ThrowIfNull(api);
        api.MapGet("/lots/{lotNumber}", GetLotAsync)
            .RequireAuthorization(Policies.PersonOrStation)
            .WithName("GetLot")
            .WithSummary("A lot's summary: status, sample size, counts and the plan's decision so far")
            .ProducesProblem(StatusCodes.Status401Unauthorized)
            .ProducesProblem(StatusCodes.Status404NotFound);
        return api;
    }

    private static async Task<Results<Ok<LotProgress>, ProblemHttpResult>> GetLotAsync(string lotNumber, LotService lots, CancellationToken cancellationToken)
    {
        try
        {
            return TypedResults.Ok(LotProgress.From(await lots.GetSummaryAsync(lotNumber, cancellationToken).ConfigureAwait(false)));
        }
        catch (RecordNotFoundException e)
        {
            return Problems.Make(StatusCodes.Status404NotFound, "Not found", e.Message);
        }
    }
}
