namespace FilterQA.Web.Accounts;

/// <summary>What a sign-in attempt gave: success, or the plain reason shown on the sign-in page.</summary>
public sealed record SignInOutcome(bool Succeeded, string? Error)
{
    public static SignInOutcome Success { get; } = new(true, null);

    /// <summary>Signed in with a one-time password that must be replaced before anything else.</summary>
    public bool MustChangePassword { get; init; }

    public static SignInOutcome Failed(string error) => new(false, error);
}
