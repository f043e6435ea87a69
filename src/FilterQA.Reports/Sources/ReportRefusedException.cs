namespace FilterQA.Reports.Sources;

/// <summary>A document cannot be made from what is stored (a rejection report of a lot that is not rejected, a period without lots); the message says why.</summary>
public sealed class ReportRefusedException : Exception
{
    public ReportRefusedException()
    {
    }

    public ReportRefusedException(string message)
        : base(message)
    {
    }

    public ReportRefusedException(string message, Exception innerException)
        : base(message, innerException)
    {
    }
}
