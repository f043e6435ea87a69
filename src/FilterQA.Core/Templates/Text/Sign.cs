namespace FilterQA.Core.Templates.Text;

/// <summary>What sign a quantity field allows.</summary>
internal enum Sign
{
    /// <summary>Any finite value (offsets).</summary>
    Any,

    /// <summary>Zero or more (uncertainties, apertures).</summary>
    NonNegative,

    /// <summary>Above zero (limits, levels).</summary>
    Positive,
}
