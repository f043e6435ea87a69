namespace FilterQA.Web.Watching;

/// <summary>The "Watch" configuration section: how watched folders are polled.</summary>
public sealed class WatchOptions
{
    public const string Section = "Watch";

    /// <summary>Seconds between scans of each watched folder; default 2.</summary>
    public double PollSeconds { get; set; } = 2;

    /// <summary>A file is taken only when its size and modification time have not changed for this many seconds; default 2.</summary>
    public double StableSeconds { get; set; } = 2;
}
