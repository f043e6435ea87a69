namespace FilterQA.Web.Setup;

/// <summary>First-start work: schema, roles, the first administrator, and the demo scenario when asked for.</summary>
public static class SetupServiceCollectionExtensions
{
    public static IServiceCollection AddFilterQaSetup(this IServiceCollection services, IConfiguration configuration)
    {
        ArgumentNullException.ThrowIfNull(configuration);
        var demo = new DemoOptions();
        configuration.GetSection(DemoOptions.Section).Bind(demo);
        services.AddSingleton(demo);
        services.AddSingleton(new SetupConsole(Console.Out));
        services.AddScoped<AccountSeeder>();
        services.AddScoped<DemoSeeder>();
        // First in the list, so its StartingAsync runs before the watched folders start.
        services.AddHostedService<FirstStartService>();
        return services;
    }
}
