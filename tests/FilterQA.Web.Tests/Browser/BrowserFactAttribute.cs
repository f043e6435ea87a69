namespace FilterQA.Web.Tests.Browser;

/// <summary>A browser test: skipped with the reason when Chromium is missing, except under CI=true, where it runs and fails.</summary>
[AttributeUsage(AttributeTargets.Method)]
public sealed class BrowserFactAttribute : FactAttribute
{
    public BrowserFactAttribute()
    {
        if (!BrowserHost.IsCi && !File.Exists(BrowserHost.ChromiumPath))
        {
            Skip = $"{BrowserHost.ChromiumPath} is missing: install Debian's chromium package (.ci/run does)";
        }
    }
}
