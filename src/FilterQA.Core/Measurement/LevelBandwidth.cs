namespace FilterQA.Core.Measurement;

/// <summary>
/// The band edges at one relative level: the frequencies where the loss is <see cref="LevelDb"/> above the
/// minimum loss, and what follows from them. All frequencies in Hz; null means "not measurable" (see each).
/// </summary>
/// <param name="LevelDb">The level asked for, dB below the minimum-loss point (positive), exactly as given.</param>
/// <param name="LowerHz">Lower edge, Hz, interpolated linearly in dB; null when the level is not reached (or, outermost, not held to the sweep start) below the minimum-loss point. Never a sweep end point by default.</param>
/// <param name="UpperHz">Upper edge, Hz; null likewise above the minimum-loss point.</param>
/// <param name="BandwidthHz">UpperHz − LowerHz, Hz; null unless both edges exist.</param>
/// <param name="CentreHz">Arithmetic centre (LowerHz + UpperHz)/2, Hz (the crystal, ceramic and SAW convention); null unless both edges exist.</param>
/// <param name="GeometricCentreHz">Geometric centre √(LowerHz·UpperHz), Hz (wideband LC convention); null unless both edges exist.</param>
public sealed record LevelBandwidth(double LevelDb, double? LowerHz, double? UpperHz, double? BandwidthHz, double? CentreHz, double? GeometricCentreHz)
{
    /// <summary>Makes the record from the two edges, deriving bandwidth and centres when both exist.</summary>
    public static LevelBandwidth FromEdges(double levelDb, double? lowerHz, double? upperHz)
    {
        if (lowerHz is { } lower && upperHz is { } upper)
        {
            return new LevelBandwidth(levelDb, lower, upper, upper - lower, 0.5 * (lower + upper), Math.Sqrt(lower * upper));
        }
        return new LevelBandwidth(levelDb, lowerHz, upperHz, null, null, null);
    }
}
