namespace FilterQA.Web.Setup;

/// <summary>
/// Where first-start secrets (one-time passwords, PINs) are printed: the console, never the log, because logs
/// are kept and shipped. Tests give their own writer.
/// </summary>
public sealed class SetupConsole(TextWriter writer)
{
    public TextWriter Out { get; } = writer;
}
