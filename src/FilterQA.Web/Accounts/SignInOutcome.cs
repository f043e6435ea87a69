namespace FilterQA.Web.Accounts;

/// <summary>What a sign-in attempt gave: success, or the plain reason shown on the sign-in page.</summary>
public sealed record SignInOutcome(bool Succeeded, string? Error)
{
    public static SignInOutcome Success { get; } = new(true, null);

    public static SignInOutcome Failed(string error) => new(false, error);
}
