namespace FilterQA.Core.Formats.Delimited;

/// <summary>Outcome of reading one number cell.</summary>
internal enum DelimitedNumberStatus
{
    /// <summary>A finite number.</summary>
    Ok,

    /// <summary>The cell is empty or white space.</summary>
    Empty,

    /// <summary>Not a decimal number (letters, two decimal marks, thousands separators, ...).</summary>
    NotNumber,

    /// <summary>Spelled as NaN or an infinity.</summary>
    NotFinite,

    /// <summary>A number beyond the range of a double (e.g. 1e400).</summary>
    Overflow,

    /// <summary>A decimal comma where only a decimal point is allowed.</summary>
    DecimalCommaNotAllowed,
}
