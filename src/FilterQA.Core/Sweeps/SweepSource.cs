namespace FilterQA.Core.Sweeps;

/// <summary>Where a sweep came from: file name, format, the file's own notes and the reader's warnings.</summary>
/// <param name="FileName">Name the sweep was read under (no directory needed); never null, may be empty.</param>
/// <param name="Format">File format.</param>
/// <param name="Sha256">Lower-case hex SHA-256 of the original bytes, or empty when there were none.</param>
/// <param name="Notes">Instrument notes: comment lines of the file, in order, without the comment mark.</param>
/// <param name="Warnings">Things the reader accepted but the user should know (ignored extra option line, BOM, ...).</param>
public sealed record SweepSource(string FileName, SweepFormat Format, string Sha256, IReadOnlyList<string> Notes, IReadOnlyList<string> Warnings)
{
    /// <summary>A source with no notes and no warnings.</summary>
    public static SweepSource Of(string fileName, SweepFormat format, string sha256 = "") => new(fileName, format, sha256, [], []);
}
