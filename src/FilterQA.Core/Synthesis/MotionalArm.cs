namespace FilterQA.Core.Synthesis;

/// <summary>One series R–L–C motional branch of a Butterworth–Van Dyke model: ohm, henry, farad.</summary>
internal readonly record struct MotionalArm(double ROhm, double LH, double CF)
{
    /// <summary>Series resonance 1/(2π√(LC)), Hz.</summary>
    public double SeriesResonanceHz => 1 / (2 * Math.PI * Math.Sqrt(LH * CF));
}
