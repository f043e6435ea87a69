namespace FilterQA.Data.Hosting;

/// <summary>Where FilterQA keeps its files when nobody says otherwise.</summary>
public static class DataFolder
{
    /// <summary>
    /// The configured folder when given (made absolute against the user's home, not the current
    /// directory), else $XDG_DATA_HOME/filterqa when that is an absolute path (the XDG base-directory
    /// specification ignores relative values), else HOME/.local/share/filterqa.
    /// </summary>
    public static string Resolve(string? configured, Func<string, string?> environment)
    {
        ArgumentNullException.ThrowIfNull(environment);
        string home = environment("HOME") is { Length: > 0 } h ? h : Environment.GetFolderPath(Environment.SpecialFolder.UserProfile);
        if (!string.IsNullOrWhiteSpace(configured))
        {
            string expanded = configured.StartsWith("~/", StringComparison.Ordinal) ? Path.Combine(home, configured[2..]) : configured;
            return Path.IsPathRooted(expanded) ? Path.GetFullPath(expanded) : Path.GetFullPath(Path.Combine(home, expanded));
        }
        if (environment("XDG_DATA_HOME") is { Length: > 0 } xdg && Path.IsPathRooted(xdg))
        {
            return Path.Combine(xdg, "filterqa");
        }
        if (string.IsNullOrEmpty(home))
        {
            throw new InvalidOperationException("no data folder: Storage:DataFolder is not set and neither XDG_DATA_HOME nor HOME is known");
        }
        return Path.Combine(home, ".local", "share", "filterqa");
    }

    /// <summary><see cref="Resolve(string?, Func{string, string?})"/> with the process environment.</summary>
    public static string Resolve(string? configured) => Resolve(configured, Environment.GetEnvironmentVariable);
}
