using System.Globalization;
using System.Numerics;

namespace FilterQA.Core.Sweeps;

/// <summary>
/// The view of one path of a sweep that measurements work on: a loss in dB per point
/// (positive = attenuation, −20·log10|x|) and, where the sweep has it, the phase in radians.
/// For a transmission path the loss is the insertion loss; for a reflection path it is the return loss.
/// Immutable; every value finite.
/// </summary>
public sealed class ResponseTrace
{
    /// <summary>
    /// Loss given to a point whose magnitude is exactly zero, dB. Far below any instrument's floor,
    /// so it can never pass a limit by accident, but finite so arithmetic stays defined.
    /// </summary>
    public const double ZeroMagnitudeLossDb = 400;

    private readonly double[] _lossDb;
    private readonly double[]? _phaseRad;

    private ResponseTrace(FrequencyGrid grid, ResponsePath path, double[] lossDb, double[]? phaseRad)
    {
        Grid = grid;
        Path = path;
        _lossDb = lossDb;
        _phaseRad = phaseRad;
    }

    /// <summary>The frequencies.</summary>
    public FrequencyGrid Grid { get; }

    /// <summary>Which path this is.</summary>
    public ResponsePath Path { get; }

    /// <summary>Loss per point, dB, positive for attenuation.</summary>
    public ReadOnlySpan<double> LossDb => _lossDb;

    /// <summary>True when <see cref="PhaseRad"/> holds a phase per point.</summary>
    public bool HasPhase => _phaseRad is not null;

    /// <summary>Phase per point, radians, as measured (not necessarily unwrapped); empty without phase.</summary>
    public ReadOnlySpan<double> PhaseRad => _phaseRad;

    /// <summary>Makes a trace from copies.</summary>
    /// <exception cref="ArgumentException">Lengths differ from the grid or a value is not finite.</exception>
    public static ResponseTrace Create(FrequencyGrid grid, ResponsePath path, ReadOnlySpan<double> lossDb, ReadOnlySpan<double> phaseRad = default)
    {
        ArgumentNullException.ThrowIfNull(grid);
        return Own(grid, path, lossDb.ToArray(), phaseRad.IsEmpty ? null : phaseRad.ToArray());
    }

    /// <summary>Takes ownership of arrays; validates them.</summary>
    internal static ResponseTrace Own(FrequencyGrid grid, ResponsePath path, double[] lossDb, double[]? phaseRad)
    {
        FiniteValues.Check(grid, lossDb, "loss");
        if (phaseRad is not null)
        {
            FiniteValues.Check(grid, phaseRad, "phase");
        }
        return new ResponseTrace(grid, path, lossDb, phaseRad);
    }

    /// <summary>
    /// The main path of a sweep: S21 of a network with two or more ports, S11 of a one-port
    /// (then <see cref="Path"/> is <see cref="ResponsePath.InputReflection"/>), or the scalar trace
    /// (a dBm trace is read as dB relative to 1 mW until a thru normalises it).
    /// </summary>
    public static ResponseTrace Primary(Sweep sweep)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        if (sweep.Network is { } network)
        {
            return network.PortCount == 1
                ? FromComplex(network.Grid, ResponsePath.InputReflection, network.Trace(1, 1))
                : FromComplex(network.Grid, ResponsePath.Transmission, network.Trace(2, 1));
        }
        ScalarTrace scalar = sweep.Scalar!;
        var loss = new double[scalar.Grid.Count];
        ReadOnlySpan<double> level = scalar.LevelDb;
        for (int i = 0; i < loss.Length; i++)
        {
            loss[i] = -level[i];
        }
        double[]? phase = null;
        if (scalar.HasPhase)
        {
            phase = new double[loss.Length];
            ReadOnlySpan<double> deg = scalar.PhaseDeg;
            for (int i = 0; i < phase.Length; i++)
            {
                phase[i] = deg[i] * (Math.PI / 180.0);
            }
        }
        return new ResponseTrace(scalar.Grid, ResponsePath.Transmission, loss, phase);
    }

    /// <summary>
    /// The reflection at <paramref name="port"/> (1 → S11, 2 → S22), or null when the sweep has no
    /// such data (a scalar trace, or a one-port asked for port 2).
    /// </summary>
    public static ResponseTrace? Reflection(Sweep sweep, int port)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        if (port is not (1 or 2))
        {
            throw new ArgumentOutOfRangeException(nameof(port), port, "reflection is read at port 1 or 2");
        }
        if (sweep.Network is not { } network || port > network.PortCount)
        {
            return null;
        }
        return FromComplex(network.Grid, port == 1 ? ResponsePath.InputReflection : ResponsePath.OutputReflection, network.Trace(port, port));
    }

    /// <summary>Loss and phase of a complex trace: −20·log10|x| and arg x.</summary>
    public static ResponseTrace FromComplex(FrequencyGrid grid, ResponsePath path, ReadOnlySpan<Complex> values)
    {
        ArgumentNullException.ThrowIfNull(grid);
        var loss = new double[values.Length];
        var phase = new double[values.Length];
        for (int i = 0; i < values.Length; i++)
        {
            double magnitude = values[i].Magnitude;
            loss[i] = magnitude > 0 ? Math.Min(-20.0 * Math.Log10(magnitude), ZeroMagnitudeLossDb) : ZeroMagnitudeLossDb;
            phase[i] = values[i].Phase;
        }
        return Own(grid, path, loss, phase);
    }
}
