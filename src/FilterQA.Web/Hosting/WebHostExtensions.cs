using FilterQA.Web.Ui;
using System.Text.Json.Serialization;
using FilterQA.Data.Hosting;
using FilterQA.Data.Services;
using FilterQA.Reports.Hosting;
using FilterQA.Web.Accounts;
using FilterQA.Web.Api;
using FilterQA.Web.Components;
using FilterQA.Web.Documents;
using FilterQA.Web.Files;
using FilterQA.Web.Setup;
using FilterQA.Web.Templates;
using FilterQA.Web.Watching;
using Serilog;

namespace FilterQA.Web.Hosting;

/// <summary>Everything the host registers and maps, so Program.cs stays a few lines.</summary>
public static class WebHostExtensions
{
    /// <summary>Logging, storage, accounts, pages, the intake API, watched folders and first-start work.</summary>
    public static WebApplicationBuilder AddFilterQaWeb(this WebApplicationBuilder builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        IServiceCollection services = builder.Services;
        IConfiguration configuration = builder.Configuration;

        services.AddSerilog((provider, logger) => logger.ReadFrom.Configuration(configuration).Enrich.FromLogContext().WriteTo.Console());
        services.AddFilterQaStorage(configuration);
        services.AddScoped<StationApiKeys>();
        services.AddFilterQaUi();
        services.AddFilterQaReports(configuration);
        services.AddProblemDetails();
        services.ConfigureHttpJsonOptions(json => json.SerializerOptions.Converters.Add(new JsonStringEnumConverter()));

        services.AddFilterQaAccounts(configuration);
        services.AddRazorComponents().AddInteractiveServerComponents();
        services.AddCascadingAuthenticationState();
        services.AddFilterQaApi(configuration);
        services.AddFilterQaSetup(configuration);
        services.AddFilterQaWatchFolders(configuration);
        services.AddVerificationRateLimit();
        return builder;
    }

    /// <summary>The request pipeline and every endpoint.</summary>
    public static WebApplication UseFilterQaWeb(this WebApplication app)
    {
        ArgumentNullException.ThrowIfNull(app);
        if (!app.Environment.IsDevelopment())
        {
            app.UseExceptionHandler();
        }
        app.Logger.LogInformation("Serving static files from {WebRoot}", app.Environment.WebRootPath);
        app.UseStatusCodePages();
        app.UseSerilogRequestLogging();
        // The repository's wwwroot/ (app.css, images): served before routing and authentication, to anyone.
        app.UseStaticFiles();
        app.UseRouting();
        app.UseAuthentication();
        app.UseAuthorization();
        app.UseRateLimiter();
        app.UseAntiforgery();

        app.MapStaticAssets().AllowAnonymous();
        app.MapGet("/health", () => TypedResults.Ok(new HealthAnswer("ok"))).AllowAnonymous().ExcludeFromDescription();
        app.MapAccountEndpoints();
        app.MapFilterQaApi();
        app.MapLotExportEndpoints();
        app.MapTemplateFileEndpoints();
        app.MapDocumentEndpoints();
        app.MapRazorComponents<App>()
            .AddInteractiveServerRenderMode()
            .AddAdditionalAssemblies(PageAssemblies.Additional);
        return app;
    }
}
