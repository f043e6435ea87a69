namespace FilterQA.Data.Tests.Infrastructure;

/// <summary>
/// Where the PostgreSQL tests find their server: FILTERQA_TEST_POSTGRES, a connection string
/// without a database (each test class makes its own). When it is missing, a CI run fails
/// those tests (a missing prerequisite must not pass as skipped); elsewhere they are skipped.
/// </summary>
public static class PostgresEnvironment
{
    public const string Variable = "FILTERQA_TEST_POSTGRES";

    public static string? ConnectionString => Environment.GetEnvironmentVariable(Variable) is { Length: > 0 } value ? value : null;

    public static bool IsCi => string.Equals(Environment.GetEnvironmentVariable("CI"), "true", StringComparison.OrdinalIgnoreCase);

    /// <summary>Why the PostgreSQL tests are skipped, or null when they run (server given, or CI, where they fail without one).</summary>
    public static string? SkipReason => ConnectionString is null && !IsCi
        ? $"PostgreSQL tests need {Variable} (e.g. Host=127.0.0.1;Port=55432;Username=postgres); .ci/run starts a server and sets it"
        : null;

    public static string MissingMessage =>
        $"{Variable} is not set: the PostgreSQL tests need a server (CI=true, so this fails instead of skipping)";
}
