namespace FilterQA.Core.Formats.Delimited;

/// <summary>The dB unit a header cell names.</summary>
internal enum DelimitedLevelUnit
{
    /// <summary>No dB unit in the header cell.</summary>
    None,

    /// <summary>"dB": a gain (ratio).</summary>
    Db,

    /// <summary>"dBm": a power relative to 1 mW.</summary>
    Dbm,

    /// <summary>Another dB unit (dBuV, dBc, dBW, ...) that a sweep level cannot be.</summary>
    Other,
}
