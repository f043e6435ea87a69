namespace FilterQA.Web.Accounts;

/// <summary>Return addresses after sign-in: only paths on this site, so a link cannot send a person elsewhere.</summary>
public static class LocalUrl
{
    /// <summary>True for "/" and "/path…", false for absolute URLs, "//host", "/\host" and anything with control characters.</summary>
    public static bool IsLocal(string? url) =>
        !string.IsNullOrEmpty(url)
        && url[0] == '/'
        && (url.Length == 1 || (url[1] != '/' && url[1] != '\\'))
        && !url.Any(char.IsControl);

    /// <summary><paramref name="url"/> when local, else "/".</summary>
    public static string OrHome(string? url) => IsLocal(url) ? url! : "/";
}
