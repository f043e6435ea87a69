namespace FilterQA.Core.Formats.Touchstone;

/// <summary>The parameter letter of an option line.</summary>
internal enum TouchstoneParameter
{
    /// <summary>Scattering parameters.</summary>
    S,

    /// <summary>Admittance parameters (normalised to R in version 1, siemens in version 2).</summary>
    Y,

    /// <summary>Impedance parameters (normalised to R in version 1, ohms in version 2).</summary>
    Z,

    /// <summary>Hybrid parameters (two-ports only; not read).</summary>
    H,

    /// <summary>Inverse hybrid parameters (two-ports only; not read).</summary>
    G,
}
