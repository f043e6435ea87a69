namespace FilterQA.Reports.Pdf;

/// <summary>What every page repeats: the document title at the top left, the lot or part at the top right, and a footer note at the bottom left.</summary>
public sealed record RunningHeader(string Title, string Reference, string FooterNote);
