namespace FilterQA.Core.Sweeps;

/// <summary>The file format a sweep was read from.</summary>
public enum SweepFormat
{
    /// <summary>Touchstone version 1.x (.sNp).</summary>
    Touchstone1,

    /// <summary>Touchstone version 2.0.</summary>
    Touchstone2,

    /// <summary>Comma, tab or semicolon delimited text.</summary>
    DelimitedText,

    /// <summary>FilterQA's JSON sweep body (intake API).</summary>
    Json,

    /// <summary>Made by the demo synthesiser, never measured.</summary>
    Synthetic,
}
