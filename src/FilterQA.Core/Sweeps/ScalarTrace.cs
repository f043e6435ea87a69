using System.Globalization;

namespace FilterQA.Core.Sweeps;

/// <summary>
/// A magnitude-only (optionally phase) trace: a gain in dB or a power in dBm per point, as
/// instruments and spreadsheets export it. Immutable; NaN and infinities cannot enter.
/// </summary>
public sealed class ScalarTrace
{
    private readonly double[] _levelDb;
    private readonly double[]? _phaseDeg;

    private ScalarTrace(FrequencyGrid grid, ScalarQuantity quantity, double[] levelDb, double[]? phaseDeg)
    {
        Grid = grid;
        Quantity = quantity;
        _levelDb = levelDb;
        _phaseDeg = phaseDeg;
    }

    /// <summary>The frequencies.</summary>
    public FrequencyGrid Grid { get; }

    /// <summary>Whether <see cref="LevelDb"/> is a gain (dB) or a power (dBm).</summary>
    public ScalarQuantity Quantity { get; }

    /// <summary>Level per point: a gain in dB (negative for a loss) or a power in dBm, see <see cref="Quantity"/>.</summary>
    public ReadOnlySpan<double> LevelDb => _levelDb;

    /// <summary>True when the trace carries a phase.</summary>
    public bool HasPhase => _phaseDeg is not null;

    /// <summary>Phase per point in degrees as exported (wrapped or not); empty when <see cref="HasPhase"/> is false.</summary>
    public ReadOnlySpan<double> PhaseDeg => _phaseDeg;

    /// <summary>Makes a trace from copies of the arrays.</summary>
    /// <exception cref="ArgumentException">Lengths differ from the grid, or a value is NaN or infinite.</exception>
    public static ScalarTrace Create(FrequencyGrid grid, ScalarQuantity quantity, ReadOnlySpan<double> levelDb, ReadOnlySpan<double> phaseDeg = default)
    {
        ArgumentNullException.ThrowIfNull(grid);
        return Own(grid, quantity, levelDb.ToArray(), phaseDeg.IsEmpty ? null : phaseDeg.ToArray());
    }

    /// <summary>Takes ownership of arrays built by a reader; validates them.</summary>
    internal static ScalarTrace Own(FrequencyGrid grid, ScalarQuantity quantity, double[] levelDb, double[]? phaseDeg)
    {
        FiniteValues.Check(grid, levelDb, "level");
        if (phaseDeg is not null)
        {
            FiniteValues.Check(grid, phaseDeg, "phase");
        }
        return new ScalarTrace(grid, quantity, levelDb, phaseDeg);
    }
}
