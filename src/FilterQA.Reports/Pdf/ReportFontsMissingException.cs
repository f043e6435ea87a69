namespace FilterQA.Reports.Pdf;

/// <summary>The fonts a document needs were not found; the message lists every path searched.</summary>
public sealed class ReportFontsMissingException : Exception
{
    public ReportFontsMissingException(string message, IReadOnlyList<string> searchedPaths)
        : base(message) => SearchedPaths = searchedPaths;

    public ReportFontsMissingException()
        : this("the report fonts were not found", [])
    {
    }

    public ReportFontsMissingException(string message)
        : this(message, [])
    {
    }

    public ReportFontsMissingException(string message, Exception innerException)
        : base(message, innerException) => SearchedPaths = [];

    /// <summary>The folders and files looked at, in order.</summary>
    public IReadOnlyList<string> SearchedPaths { get; }
}
