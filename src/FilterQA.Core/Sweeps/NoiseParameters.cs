using System.Globalization;

namespace FilterQA.Core.Sweeps;

/// <summary>
/// The two-port noise block of a Touchstone file, kept apart from the network data:
/// minimum noise figure (dB), optimum source reflection (magnitude and angle in degrees)
/// and equivalent noise resistance (ohm, un-normalised) per noise frequency.
/// </summary>
public sealed class NoiseParameters
{
    private readonly double[] _minNoiseFigureDb;
    private readonly double[] _gammaOptMagnitude;
    private readonly double[] _gammaOptAngleDeg;
    private readonly double[] _noiseResistanceOhm;

    private NoiseParameters(FrequencyGrid grid, double[] nf, double[] mag, double[] ang, double[] rn)
    {
        Grid = grid;
        _minNoiseFigureDb = nf;
        _gammaOptMagnitude = mag;
        _gammaOptAngleDeg = ang;
        _noiseResistanceOhm = rn;
    }

    /// <summary>Noise frequencies (their own grid, not the network's).</summary>
    public FrequencyGrid Grid { get; }

    /// <summary>Minimum noise figure, dB.</summary>
    public ReadOnlySpan<double> MinNoiseFigureDb => _minNoiseFigureDb;

    /// <summary>Magnitude of the optimum source reflection coefficient.</summary>
    public ReadOnlySpan<double> GammaOptMagnitude => _gammaOptMagnitude;

    /// <summary>Angle of the optimum source reflection coefficient, degrees.</summary>
    public ReadOnlySpan<double> GammaOptAngleDeg => _gammaOptAngleDeg;

    /// <summary>Equivalent noise resistance, ohm (already multiplied by the reference for version 1 files).</summary>
    public ReadOnlySpan<double> NoiseResistanceOhm => _noiseResistanceOhm;

    /// <summary>Makes a noise block from copies; every array as long as the grid, every value finite.</summary>
    /// <exception cref="ArgumentException">Lengths differ or a value is not finite.</exception>
    public static NoiseParameters Create(FrequencyGrid grid, ReadOnlySpan<double> minNoiseFigureDb, ReadOnlySpan<double> gammaOptMagnitude,
        ReadOnlySpan<double> gammaOptAngleDeg, ReadOnlySpan<double> noiseResistanceOhm)
    {
        ArgumentNullException.ThrowIfNull(grid);
        double[][] all = [minNoiseFigureDb.ToArray(), gammaOptMagnitude.ToArray(), gammaOptAngleDeg.ToArray(), noiseResistanceOhm.ToArray()];
        foreach (double[] values in all)
        {
            if (values.Length != grid.Count || Array.Exists(values, v => !double.IsFinite(v)))
            {
                throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                    $"every noise column needs {grid.Count} finite values"));
            }
        }
        return new NoiseParameters(grid, all[0], all[1], all[2], all[3]);
    }
}
