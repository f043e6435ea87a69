namespace FilterQA.Web.Ui.Services;

/// <summary>What the stations page holds a thru against.</summary>
public static class ThruLimits
{
    /// <summary>
    /// Peak-to-peak loss variation of a thru over its sweep above which the page flags it, dB.
    /// Common practice, no published source: a fixture whose thru varies more than about half a decibel
    /// usually has a loose connector or a damaged cable. The template's maximum thru age is checked by the intake.
    /// </summary>
    public const double FlatnessLimitDb = 0.5;
}
