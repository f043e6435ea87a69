using FilterQA.Reports.Documents;
using FilterQA.Reports.Pdf;
using FilterQA.Reports.Sources;
using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.DependencyInjection;

namespace FilterQA.Reports.Hosting;

/// <summary>Registers the document renderers (singletons over the process's fonts) and the storage content source.</summary>
public static class ReportServiceCollectionExtensions
{
    /// <summary>The configuration key of a folder holding DejaVuSans.ttf, DejaVuSans-Bold.ttf and DejaVuSansMono.ttf.</summary>
    public const string FontFolderKey = "Reports:FontFolder";

    public static IServiceCollection AddFilterQaReports(this IServiceCollection services, IConfiguration configuration)
    {
        ArgumentNullException.ThrowIfNull(configuration);
        string? folder = configuration[FontFolderKey];
        // Fonts are looked up on first use, so a missing font fails the document request with its reason, not the start of the app.
        services.AddSingleton(_ => ReportFonts.Load(folder));
        services.AddSingleton(sp => new CertificateDocument(sp.GetRequiredService<ReportFonts>()));
        services.AddSingleton(sp => new RejectionReportDocument(sp.GetRequiredService<ReportFonts>()));
        services.AddSingleton(sp => new YieldReportDocument(sp.GetRequiredService<ReportFonts>()));
        services.AddSingleton(sp => new UnitReportDocument(sp.GetRequiredService<ReportFonts>()));
        services.AddScoped<ReportContentSource>();
        return services;
    }
}
