namespace FilterQA.Web.Api.Intake;

/// <summary>
/// The JSON form of a sweep: either <see cref="Touchstone"/> text, or arrays of frequency (Hz), gain (dB,
/// negative for a loss, as S21 is shown) and optionally phase (degrees). <see cref="FileName"/> names it.
/// </summary>
public sealed class SweepJsonBody
{
    /// <summary>The sweep's file name (its extension picks the reader for Touchstone text).</summary>
    public string? FileName { get; set; }

    /// <summary>A whole Touchstone file as text.</summary>
    public string? Touchstone { get; set; }

    /// <summary>Frequencies, Hz, strictly increasing.</summary>
    public double[]? FrequencyHz { get; set; }

    /// <summary>Gain at each frequency, dB (a loss is negative here).</summary>
    public double[]? GainDb { get; set; }

    /// <summary>Phase at each frequency, degrees; optional.</summary>
    public double[]? PhaseDeg { get; set; }
}
