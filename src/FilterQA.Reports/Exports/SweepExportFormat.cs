namespace FilterQA.Reports.Exports;

/// <summary>How the raw sweeps of a lot are put in the zip.</summary>
public enum SweepExportFormat
{
    /// <summary>Each file exactly as stored, under its original name (a network analyser's Touchstone file; a power trace stays the delimited text it came as).</summary>
    Touchstone,

    /// <summary>Each sweep read and written again as delimited text (comma separated, see DelimitedTextWriter).</summary>
    Csv,
}
