namespace FilterQA.Web.Accounts;

/// <summary>The "Auth" configuration section.</summary>
public sealed class AuthOptions
{
    /// <summary>Configuration section name.</summary>
    public const string Section = "Auth";

    /// <summary>Minutes without a request after which a person is signed out (sliding cookie expiry); 1 to 1440, default 15.</summary>
    public int IdleMinutes { get; set; } = 15;
}
