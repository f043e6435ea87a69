using FilterQA.Data.Services;
using FilterQA.Data.Services.Certificates;
using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.DependencyInjection.Extensions;

namespace FilterQA.Data.Hosting;

/// <summary>Registration of the storage and its services.</summary>
public static class StorageServiceCollectionExtensions
{
    /// <summary>
    /// Registers <see cref="FilterQaDbContext"/> for the provider in the "Storage" section, a
    /// context factory for parallel writers, <see cref="TimeProvider.System"/> (unless one is
    /// registered) and the inspection services. The host must reference the migrations project
    /// of each provider it may run on.
    /// </summary>
    public static IServiceCollection AddFilterQaStorage(this IServiceCollection services, IConfiguration configuration)
    {
        ArgumentNullException.ThrowIfNull(services);
        ArgumentNullException.ThrowIfNull(configuration);
        var options = new StorageOptions();
        IConfigurationSection section = configuration.GetSection(StorageOptions.Section);
        if (section[nameof(StorageOptions.Provider)] is { Length: > 0 } provider)
        {
            options.Provider = Enum.TryParse(provider, ignoreCase: true, out StorageProvider parsed) && Enum.IsDefined(parsed)
                ? parsed
                : throw new InvalidOperationException($"Storage:Provider '{provider}' is not known; use Sqlite or Postgres");
        }
        options.ConnectionString = section[nameof(StorageOptions.ConnectionString)];
        options.DataFolder = section[nameof(StorageOptions.DataFolder)];
        services.TryAddSingleton(ReadCertificateOptions(configuration.GetSection(CertificateOptions.Section)));
        return services.AddFilterQaStorage(options);
    }

    /// <summary>As <see cref="AddFilterQaStorage(IServiceCollection, IConfiguration)"/> with options given directly.</summary>
    public static IServiceCollection AddFilterQaStorage(this IServiceCollection services, StorageOptions options)
    {
        ArgumentNullException.ThrowIfNull(services);
        ArgumentNullException.ThrowIfNull(options);
        services.TryAddSingleton(TimeProvider.System);
        services.AddSingleton(options);
        services.AddDbContextFactory<FilterQaDbContext>(builder => StorageSetup.Configure(builder, options), ServiceLifetime.Scoped);
        services.AddScoped<TemplateCatalog>();
        services.AddScoped<StationRegistry>();
        services.AddScoped<LotService>();
        services.AddScoped<MeasurementStore>();
        services.AddScoped<SweepIntake>();
        services.AddScoped<StorageBackup>();
        services.AddScoped<WhatIfService>();
        services.TryAddSingleton(new CertificateOptions());
        services.AddScoped<CertificateService>();
        services.AddScoped<Services.Exports.LotExportReader>();
        services.AddScoped<PreviewSamples>();
        services.AddScoped<ReferenceUnitService>();
        services.AddScoped<AuditLog>();
        services.AddScoped<WhatIfUnitReader>();
        return services;
    }

    private static CertificateOptions ReadCertificateOptions(IConfigurationSection section)
    {
        var certificates = new CertificateOptions
        {
            IssuerName = section[nameof(CertificateOptions.IssuerName)],
            PublicBaseUrl = section[nameof(CertificateOptions.PublicBaseUrl)],
        };
        if (section[nameof(CertificateOptions.NumberPrefix)] is { Length: > 0 } prefix)
        {
            certificates.NumberPrefix = prefix;
        }
        if (section[nameof(CertificateOptions.Statement)] is { Length: > 0 } statement)
        {
            certificates.Statement = statement;
        }
        foreach (IConfigurationSection line in section.GetSection(nameof(CertificateOptions.IssuerAddressLines)).GetChildren())
        {
            if (line.Value is { Length: > 0 } text)
            {
                certificates.IssuerAddressLines.Add(text);
            }
        }
        return certificates;
    }
}
