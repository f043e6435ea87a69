namespace FilterQA.Reports.Pdf;

/// <summary>The three faces every document uses.</summary>
public enum FontFace
{
    /// <summary>DejaVu Sans.</summary>
    Regular,

    /// <summary>DejaVu Sans Bold.</summary>
    Bold,

    /// <summary>DejaVu Sans Mono (digests, hashes).</summary>
    Mono,
}
