using FilterQA.Data;
using FilterQA.Data.Accounts;
using Microsoft.AspNetCore.Authentication;
using Microsoft.AspNetCore.Authentication.Cookies;
using Microsoft.AspNetCore.Authorization;
using Microsoft.AspNetCore.Identity;

namespace FilterQA.Web.Accounts;

/// <summary>Accounts on the FilterQA database, the sign-in cookie, station keys and the authorization policies.</summary>
public static class AccountServiceCollectionExtensions
{
    /// <summary>Registers Identity (users and roles in <see cref="FilterQaDbContext"/>), authentication and policies.</summary>
    public static IServiceCollection AddFilterQaAccounts(this IServiceCollection services, IConfiguration configuration)
    {
        ArgumentNullException.ThrowIfNull(configuration);
        var auth = new AuthOptions();
        configuration.GetSection(AuthOptions.Section).Bind(auth);
        if (auth.IdleMinutes is < 1 or > 1440)
        {
            throw new InvalidOperationException(FormattableString.Invariant($"Auth:IdleMinutes is {auth.IdleMinutes}; give 1 to 1440 minutes"));
        }
        services.AddSingleton(auth);
        services.AddScoped<AccountSignIn>();
        // Identity's stores need the context itself (not only the factory the inspection services use).
        services.AddScoped(provider => provider.GetRequiredService<Microsoft.EntityFrameworkCore.IDbContextFactory<FilterQaDbContext>>().CreateDbContext());

        services.AddIdentityCore<FilterQaUser>(identity =>
            {
                identity.User.RequireUniqueEmail = false;
                identity.Password.RequiredLength = 10;
                identity.Lockout.MaxFailedAccessAttempts = 5;
                identity.Lockout.DefaultLockoutTimeSpan = TimeSpan.FromMinutes(5);
                identity.Lockout.AllowedForNewUsers = true;
            })
            .AddRoles<IdentityRole>()
            .AddEntityFrameworkStores<FilterQaDbContext>()
            .AddSignInManager()
            .AddClaimsPrincipalFactory<FilterQaClaimsFactory>();

        services.AddAuthentication(Policies.DefaultScheme)
            .AddPolicyScheme(Policies.DefaultScheme, "Sign-in cookie or station key", policy =>
                policy.ForwardDefaultSelector = context => context.Request.Headers.ContainsKey(Policies.ApiKeyHeader)
                    ? Policies.StationKeyScheme
                    : IdentityConstants.ApplicationScheme)
            .AddCookie(IdentityConstants.ApplicationScheme, cookie => ConfigureCookie(cookie, auth))
            .AddScheme<AuthenticationSchemeOptions, StationKeyHandler>(Policies.StationKeyScheme, null);

        services.AddAuthorizationBuilder()
            .AddPolicy(Policies.Person, policy => policy.RequireAuthenticatedUser().RequireAssertion(IsPerson))
            .AddPolicy(Policies.Administrator, policy => policy.RequireAuthenticatedUser().RequireAssertion(IsPerson).RequireRole(RoleNames.Administrator))
            .AddPolicy(Policies.StationKey, policy => policy.RequireAuthenticatedUser().RequireClaim(ActorClaims.Station))
            .AddPolicy(Policies.PersonOrStation, policy => policy.RequireAuthenticatedUser())
            // Nothing answers an anonymous caller unless it says so (sign-in, static files, /health), and a
            // station key reaches only the endpoints that name it.
            .SetFallbackPolicy(new AuthorizationPolicyBuilder().RequireAuthenticatedUser().RequireAssertion(IsPerson).Build());
        return services;
    }

    private static bool IsPerson(AuthorizationHandlerContext context) => !context.User.HasClaim(c => c.Type == ActorClaims.Station);

    private static void ConfigureCookie(CookieAuthenticationOptions cookie, AuthOptions auth)
    {
        cookie.Cookie.Name = "FilterQA.SignIn";
        cookie.Cookie.HttpOnly = true;
        cookie.Cookie.SameSite = SameSiteMode.Lax;
        cookie.Cookie.SecurePolicy = CookieSecurePolicy.SameAsRequest;
        cookie.ExpireTimeSpan = TimeSpan.FromMinutes(auth.IdleMinutes);
        cookie.SlidingExpiration = true;
        cookie.LoginPath = "/signin";
        cookie.LogoutPath = "/account/sign-out";
        cookie.AccessDeniedPath = "/signin";
        cookie.ReturnUrlParameter = "returnUrl";
        cookie.Events.OnRedirectToLogin = context =>
        {
            if (ApiProblems.IsApi(context.Request))
            {
                return ApiProblems.WriteAsync(context.HttpContext, StatusCodes.Status401Unauthorized, "Not signed in",
                    "sign in, or send a station key in the X-Api-Key header");
            }
            context.Response.Redirect(context.RedirectUri);
            return Task.CompletedTask;
        };
        cookie.Events.OnRedirectToAccessDenied = context =>
        {
            if (ApiProblems.IsApi(context.Request))
            {
                return ApiProblems.WriteAsync(context.HttpContext, StatusCodes.Status403Forbidden, "Not allowed",
                    "your account does not have the role this needs");
            }
            context.Response.Redirect("/signin?error=" + Uri.EscapeDataString("Your account may not open that page. Sign in as someone who may."));
            return Task.CompletedTask;
        };
    }
}
