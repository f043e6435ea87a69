namespace FilterQA.Core.Formats.Touchstone;

/// <summary>Which part of each matrix a version 2.0 file writes ([Matrix Format]).</summary>
internal enum TouchstoneMatrixFormat
{
    /// <summary>Every element, row by row.</summary>
    Full,

    /// <summary>Row i holds N_i1 … N_ii; the rest follows by symmetry.</summary>
    Lower,

    /// <summary>Row i holds N_ii … N_in; the rest follows by symmetry.</summary>
    Upper,
}
