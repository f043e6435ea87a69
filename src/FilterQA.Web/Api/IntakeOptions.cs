namespace FilterQA.Web.Api;

/// <summary>The "Intake" configuration section.</summary>
public sealed class IntakeOptions
{
    /// <summary>Configuration section name.</summary>
    public const string Section = "Intake";

    /// <summary>Largest sweep body accepted by the intake API, bytes; default 20 MiB. A larger body is answered 413.</summary>
    public long MaxSweepBytes { get; set; } = 20 * 1024 * 1024;
}
