using System.Threading.RateLimiting;
using FilterQA.Web.Ui.Pages;
using Microsoft.AspNetCore.RateLimiting;

namespace FilterQA.Web.Files;

/// <summary>
/// The public verification page answers anyone, so it is rate-limited per client address: enough for a person
/// checking certificates, too few for guessing digests. A refused request gets 429 with Retry-After.
/// </summary>
public static class VerificationRateLimit
{
    /// <summary>Requests per client address and minute (Verify:PermitsPerMinute overrides).</summary>
    public const int DefaultPermitsPerMinute = 30;

    public static IServiceCollection AddVerificationRateLimit(this IServiceCollection services)
    {
        ArgumentNullException.ThrowIfNull(services);
        services.AddOptions<RateLimiterOptions>().Configure<IConfiguration>((limiter, configuration) =>
        {
            int permits = configuration.GetValue("Verify:PermitsPerMinute", DefaultPermitsPerMinute);
            limiter.RejectionStatusCode = StatusCodes.Status429TooManyRequests;
            limiter.OnRejected = (context, _) =>
            {
                context.HttpContext.Response.Headers.RetryAfter = "60";
                return ValueTask.CompletedTask;
            };
            limiter.AddPolicy(VerifyPage.RateLimitPolicy, http => RateLimitPartition.GetFixedWindowLimiter(
                http.Connection.RemoteIpAddress?.ToString() ?? "unknown",
                _ => new FixedWindowRateLimiterOptions { PermitLimit = permits, Window = TimeSpan.FromMinutes(1), QueueLimit = 0 }));
        });
        services.AddRateLimiter(_ => { });
        return services;
    }
}
