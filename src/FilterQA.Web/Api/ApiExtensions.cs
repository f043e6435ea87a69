using FilterQA.Web.Accounts;
using FilterQA.Web.Api.Intake;
using FilterQA.Web.Api.Keys;
using FilterQA.Web.Api.Lots;

namespace FilterQA.Web.Api;

/// <summary>The versioned HTTP API (/api/v1) and its OpenAPI document (/openapi/v1.json).</summary>
public static class ApiExtensions
{
    public static IServiceCollection AddFilterQaApi(this IServiceCollection services, IConfiguration configuration)
    {
        ArgumentNullException.ThrowIfNull(configuration);
        var intake = new IntakeOptions();
        configuration.GetSection(IntakeOptions.Section).Bind(intake);
        if (intake.MaxSweepBytes < 1024)
        {
            throw new InvalidOperationException(FormattableString.Invariant($"Intake:MaxSweepBytes is {intake.MaxSweepBytes}; give at least 1024 bytes"));
        }
        services.AddSingleton(intake);
        services.AddScoped<IdempotentAnswers>();
        services.AddOpenApi("v1", openApi => openApi.AddDocumentTransformer((document, _, _) =>
        {
            document.Info.Title = "FilterQA intake API";
            document.Info.Description = ApiDescription.Text;
            return Task.CompletedTask;
        }));
        return services;
    }

    public static IEndpointRouteBuilder MapFilterQaApi(this IEndpointRouteBuilder endpoints)
    {
        // The document describes the API and holds no data; scripts fetch it before they have a key.
        // Like every endpoint but sign-in and health, the document answers only a signed-in person or a station key.
        endpoints.MapOpenApi("/openapi/{documentName}.json").RequireAuthorization(Policies.PersonOrStation);
        RouteGroupBuilder v1 = endpoints.MapGroup("/api/v1").WithTags("v1");
        v1.MapSweepEndpoints();
        v1.MapLotEndpoints();
        v1.MapApiKeyEndpoints();
        return endpoints;
    }
}
