using System.Globalization;

namespace FilterQA.Core.Measurement;

/// <summary>Builds warnings with invariant-culture numbers and adds them to an optional sink.</summary>
internal static class Warnings
{
    public static void Add(ICollection<MeasurementWarning>? sink, string code, string message) =>
        sink?.Add(new MeasurementWarning(code, message));

    /// <summary>
    /// Formats a number for a message, invariant: large values (frequencies) in plain digits to the millihertz, others to
    /// 6 significant digits.
    /// </summary>
    public static string N(double value) =>
        Math.Abs(value) is >= 1e5 and < 1e15
            ? value.ToString("0.###", CultureInfo.InvariantCulture)
            : value.ToString("G6", CultureInfo.InvariantCulture);

    /// <summary>Formats a count for a message.</summary>
    public static string N(int value) => value.ToString(CultureInfo.InvariantCulture);

    public static void BandCoverage(ICollection<MeasurementWarning>? sink, ReadOnlySpan<double> hz, FrequencyBand band, BandIndexRange range, string what)
    {
        if (sink is null)
        {
            return;
        }
        if (!band.IsCoveredBy(hz[0], hz[^1]))
        {
            sink.Add(new MeasurementWarning(MeasurementWarningCodes.BandNotCovered,
                $"{what} {N(band.StartHz)}–{N(band.StopHz)} Hz is not covered by the sweep {N(hz[0])}–{N(hz[^1])} Hz; only the {N(range.Count)} points inside were used"));
        }
        if (range.Count == 0)
        {
            sink.Add(new MeasurementWarning(MeasurementWarningCodes.BandEmpty,
                $"{what} {N(band.StartHz)}–{N(band.StopHz)} Hz holds no sweep point; it cannot be measured"));
        }
    }
}
