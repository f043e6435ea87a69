using System.Globalization;
using System.Numerics;
using System.Text;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Formats.Touchstone;

/// <summary>
/// Writes a network sweep as a Touchstone version 1.1 file (S-parameters; the name should end in .sNp, N = port count).
/// </summary>
/// <remarks>
/// <para>Layout as the standard gives it: a 1-port or 2-port block on one line (2-port in the order N11 N21 N12 N22);
/// for 3 or more ports each matrix row starts a new line, at most 4 pairs per line, the first line starting with the
/// frequency. Per-port reference impedances that differ are written as "R r1 r2 ..." (version 1.1). A noise block is
/// written after the network data, Rn normalised to the reference of port 1.</para>
/// <para>Numbers are written in the invariant culture with the shortest text that reads back to the same double
/// ("R" format). Frequencies read back exactly in every unit (the decimal point is moved in the text, never divided).
/// RI values read back exactly; DB and MA values go through a logarithm or a polar conversion and read back within a
/// relative error of 1e-12 of each complex value (a few units in the last place of the sine, cosine, log10 and power
/// functions, far below any measurement's resolution).</para>
/// </remarks>
public static class TouchstoneWriter
{
    /// <summary>Writes <paramref name="sweep"/> to <paramref name="writer"/> (nothing is written when an argument is refused).</summary>
    /// <param name="sweep">A sweep of network data; its noise block, if any, is written too.</param>
    /// <param name="writer">Where the text goes; lines end in "\n".</param>
    /// <param name="options">Unit, format and comment lines; null for <see cref="TouchstoneWriteOptions.Default"/>.</param>
    /// <exception cref="ArgumentNullException"><paramref name="sweep"/> or <paramref name="writer"/> is null.</exception>
    /// <exception cref="ArgumentException">The sweep is scalar (no Touchstone form); a comment is not printable ASCII or holds a
    /// line break; DB format is asked for but a value is exactly 0 (no dB form); the noise block starts above the last
    /// network frequency (version 1 could not tell where it starts).</exception>
    public static void Write(Sweep sweep, TextWriter writer, TouchstoneWriteOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        ArgumentNullException.ThrowIfNull(writer);
        options ??= TouchstoneWriteOptions.Default;
        NetworkData network = sweep.Network ?? throw new ArgumentException(
            "a scalar sweep (magnitude only, no complex S-parameters) has no Touchstone form; only network sweeps can be written", nameof(sweep));
        Check(sweep, network, options);
        writer.Write(Compose(sweep, network, options));
    }

    /// <summary>Writes <paramref name="sweep"/> as Touchstone text; see <see cref="Write"/>.</summary>
    /// <exception cref="ArgumentNullException"><paramref name="sweep"/> is null.</exception>
    /// <exception cref="ArgumentException">As for <see cref="Write"/>.</exception>
    public static string WriteToString(Sweep sweep, TouchstoneWriteOptions? options = null)
    {
        using var writer = new StringWriter(CultureInfo.InvariantCulture);
        Write(sweep, writer, options);
        return writer.ToString();
    }

    private static void Check(Sweep sweep, NetworkData network, TouchstoneWriteOptions options)
    {
        foreach (string comment in options.Comments)
        {
            ArgumentNullException.ThrowIfNull(comment, nameof(options));
            foreach (char c in comment)
            {
                if (c != '\t' && (c < ' ' || c > '~'))
                {
                    throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                        $"comment '{comment}' holds character U+{(int)c:X4}; Touchstone comments are one line of printable ASCII"), nameof(options));
                }
            }
        }
        if (options.DataFormat == TouchstoneDataFormat.DecibelAngle)
        {
            int n = network.PortCount;
            for (int to = 1; to <= n; to++)
            {
                for (int from = 1; from <= n; from++)
                {
                    int zero = network.Trace(to, from).IndexOf(Complex.Zero);
                    if (zero >= 0)
                    {
                        throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                            $"S{to}{from} is exactly 0 at {network.Grid[zero]:R} Hz, which has no dB form; write MA or RI instead"), nameof(options));
                    }
                }
            }
        }
        if (sweep.Noise is { } noise && noise.Grid.StartHz > network.Grid.StopHz)
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                $"the noise block starts at {noise.Grid.StartHz:R} Hz, above the last network frequency {network.Grid.StopHz:R} Hz; a version 1 file marks the start of noise data only by a frequency at or below the last network frequency"),
                nameof(sweep));
        }
    }

    private static string Compose(Sweep sweep, NetworkData network, TouchstoneWriteOptions options)
    {
        int n = network.PortCount;
        int pow10 = options.FrequencyUnit.DecimalExponent();
        var text = new StringBuilder(64 + network.Grid.Count * n * n * 48);
        foreach (string comment in options.Comments)
        {
            text.Append("! ").Append(comment).Append('\n');
        }
        text.Append("# ").Append(options.FrequencyUnit.ToString().ToUpperInvariant()).Append(" S ").Append(options.DataFormat switch
        {
            TouchstoneDataFormat.DecibelAngle => "DB",
            TouchstoneDataFormat.MagnitudeAngle => "MA",
            _ => "RI",
        }).Append(" R");
        ReadOnlySpan<double> references = network.ReferenceOhm;
        bool allEqual = true;
        foreach (double r in references)
        {
            allEqual &= r == references[0];
        }
        for (int p = 0; p < (allEqual ? 1 : n); p++)
        {
            text.Append(' ').Append(Number(references[p]));
        }
        text.Append('\n');

        for (int f = 0; f < network.Grid.Count; f++)
        {
            text.Append(ScaledDecimal.Format(network.Grid[f], pow10));
            if (n <= 2)
            {
                // Version 1 writes a 2-port as N11 N21 N12 N22.
                int[][] order = n == 1 ? [[1, 1]] : [[1, 1], [2, 1], [1, 2], [2, 2]];
                foreach (int[] element in order)
                {
                    AppendPair(text, network[f, element[0], element[1]], options.DataFormat);
                }
                text.Append('\n');
                continue;
            }
            for (int row = 1; row <= n; row++)
            {
                for (int column = 1; column <= n; column++)
                {
                    if (column > 1 && (column - 1) % 4 == 0)
                    {
                        text.Append('\n');
                    }
                    AppendPair(text, network[f, row, column], options.DataFormat);
                }
                text.Append('\n');
            }
        }

        if (sweep.Noise is { } noise)
        {
            double r1 = references[0];
            for (int i = 0; i < noise.Grid.Count; i++)
            {
                text.Append(ScaledDecimal.Format(noise.Grid[i], pow10))
                    .Append(' ').Append(Number(noise.MinNoiseFigureDb[i]))
                    .Append(' ').Append(Number(noise.GammaOptMagnitude[i]))
                    .Append(' ').Append(Number(noise.GammaOptAngleDeg[i]))
                    .Append(' ').Append(Number(noise.NoiseResistanceOhm[i] / r1))
                    .Append('\n');
            }
        }
        return text.ToString();
    }

    private static void AppendPair(StringBuilder text, Complex value, TouchstoneDataFormat format)
    {
        (double a, double b) = format switch
        {
            TouchstoneDataFormat.RealImaginary => (value.Real, value.Imaginary),
            TouchstoneDataFormat.MagnitudeAngle => (value.Magnitude, value.Phase * (180.0 / Math.PI)),
            _ => (20.0 * Math.Log10(value.Magnitude), value.Phase * (180.0 / Math.PI)),
        };
        // A leading space separates every value, including the first pair from the frequency; continuation lines start with one too.
        text.Append(' ').Append(Number(a)).Append(' ').Append(Number(b));
    }

    private static string Number(double value) => value.ToString("R", CultureInfo.InvariantCulture);
}
