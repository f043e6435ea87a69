using System.Globalization;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Formats.Delimited;

/// <summary>
/// Writes a sweep as comma-delimited text that <see cref="DelimitedTextReader"/> reads back to exactly
/// the same numbers: frequencies in hertz and every value in the shortest round-trip form ("R"),
/// invariant culture, LF line ends, no quoting.
/// </summary>
/// <remarks>
/// Layout: the sweep's notes as '#' comment lines, then one header row, then one row per point.
/// <list type="bullet">
/// <item>A scalar gain trace: <c>frequency_hz,gain_db</c> (and <c>,phase_deg</c> when it has phase).</item>
/// <item>A scalar power trace: <c>frequency_hz,power_dbm</c> (and <c>,phase_deg</c>).</item>
/// <item>Network data is written as its primary path (see <see cref="ResponseTrace.Primary"/>): a
/// two-port or larger as <c>frequency_hz,s21_db,s21_phase_deg</c> (S21 gain in dB, negative for a loss,
/// and its phase in degrees in (−180, 180]); a one-port as <c>frequency_hz,s11_db,s11_phase_deg</c>. Other
/// S-parameters and noise data are not written. A point of zero magnitude is written as
/// −<see cref="ResponseTrace.ZeroMagnitudeLossDb"/> dB.</item>
/// </list>
/// Read back, every variant is a scalar trace (a one-port's S11 becomes a gain trace of the same numbers).
/// </remarks>
public static class DelimitedTextWriter
{
    /// <summary>Writes <paramref name="sweep"/> to <paramref name="writer"/> (not closed afterwards).</summary>
    /// <exception cref="ArgumentNullException">A null argument.</exception>
    public static void Write(Sweep sweep, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        ArgumentNullException.ThrowIfNull(writer);
        foreach (string note in sweep.Source.Notes)
        {
            foreach (string part in note.Split(['\r', '\n'], StringSplitOptions.None))
            {
                writer.Write("# ");
                writer.Write(Printable(part));
                writer.Write('\n');
            }
        }
        ReadOnlySpan<double> hz = sweep.Grid.Hz;
        if (sweep.Scalar is { } scalar)
        {
            string level = scalar.Quantity == ScalarQuantity.PowerDbm ? "power_dbm" : "gain_db";
            WriteRows(writer, hz, level, scalar.LevelDb, scalar.HasPhase ? "phase_deg" : null, scalar.PhaseDeg, 1.0);
            return;
        }
        ResponseTrace primary = ResponseTrace.Primary(sweep);
        string path = primary.Path == ResponsePath.Transmission ? "s21" : "s11";
        var gainDb = new double[primary.LossDb.Length];
        for (int i = 0; i < gainDb.Length; i++)
        {
            gainDb[i] = -primary.LossDb[i];
        }
        WriteRows(writer, hz, path + "_db", gainDb, path + "_phase_deg", primary.PhaseRad, 180.0 / Math.PI);
    }

    private static void WriteRows(TextWriter writer, ReadOnlySpan<double> hz, string levelName, ReadOnlySpan<double> level,
        string? phaseName, ReadOnlySpan<double> phase, double phaseScale)
    {
        writer.Write("frequency_hz,");
        writer.Write(levelName);
        if (phaseName is not null)
        {
            writer.Write(',');
            writer.Write(phaseName);
        }
        writer.Write('\n');
        for (int i = 0; i < hz.Length; i++)
        {
            writer.Write(hz[i].ToString("R", CultureInfo.InvariantCulture));
            writer.Write(',');
            writer.Write(level[i].ToString("R", CultureInfo.InvariantCulture));
            if (phaseName is not null)
            {
                writer.Write(',');
                writer.Write((phase[i] * phaseScale).ToString("R", CultureInfo.InvariantCulture));
            }
            writer.Write('\n');
        }
    }

    // The reader refuses control characters, so notes from other sources must not bring any in.
    private static string Printable(string text) =>
        string.Create(text.Length, text, static (span, source) =>
        {
            for (int i = 0; i < span.Length; i++)
            {
                char c = source[i];
                span[i] = c < ' ' || c == '\u007F' || c == '\uFFFD' ? ' ' : c;
            }
        });
}
