namespace FilterQA.Web.Ui.Services;

/// <summary>A sweep file as the browser sent it: its name and its bytes exactly as received.</summary>
public sealed record SweepFile(string FileName, ReadOnlyMemory<byte> Bytes);
