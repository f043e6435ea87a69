using FilterQA.Web.Ui.Services;
using Microsoft.Extensions.DependencyInjection;

namespace FilterQA.Web.Ui;

/// <summary>Registration of the screens' services; the host calls it after <c>AddFilterQaStorage</c>.</summary>
public static class UiServiceCollectionExtensions
{
    /// <summary>
    /// Registers the page models and read-only directories, scoped (one per circuit), so a bench session
    /// lives as long as the operator's page. Needs the storage services (<c>AddFilterQaStorage</c>).
    /// </summary>
    public static IServiceCollection AddFilterQaUi(this IServiceCollection services)
    {
        ArgumentNullException.ThrowIfNull(services);
        services.AddScoped<PartDirectory>();
        services.AddScoped<StationDirectory>();
        services.AddScoped<LotUnitsReader>();
        services.AddScoped<LotPageModel>();
        services.AddScoped<LotDocumentsModel>();
        services.AddScoped<BenchSession>();
        services.AddScoped<DraftPreview>();
        services.AddScoped<RevisionDirectory>();
        services.AddScoped<IWhatIfEngine, WhatIfEngine>();
        services.AddScoped<WhatIfRunner>();
        services.AddScoped<TrendPageModel>();
        // Needs the host's Identity services (UserManager); only the administrator's accounts page asks for it.
        services.AddScoped<AccountDirectory>();
        return services;
    }
}
