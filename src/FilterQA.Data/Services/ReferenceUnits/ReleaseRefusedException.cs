namespace FilterQA.Data.Services;

/// <summary>
/// A draft was not released: no reason was given, the part has no reference units, or a reference unit fails the
/// draft. Nothing was stored. <see cref="Check"/> holds the reference-unit check when it was made.
/// </summary>
public sealed class ReleaseRefusedException : InvalidOperationException
{
    public ReleaseRefusedException(string message, ReferenceCheck? check = null)
        : base(message)
    {
        Check = check;
    }

    public ReleaseRefusedException(string message, Exception innerException)
        : base(message, innerException)
    {
    }

    public ReleaseRefusedException()
    {
    }

    /// <summary>The reference-unit check that refused the release; null when the release was refused before it (no reason).</summary>
    public ReferenceCheck? Check { get; }
}
