namespace FilterQA.Core.Sweeps;

/// <summary>
/// One measured (or synthesised) sweep: either n-port network data or a scalar trace, with its source.
/// Exactly one of <see cref="Network"/> and <see cref="Scalar"/> is set. Immutable.
/// </summary>
public sealed class Sweep
{
    private Sweep(NetworkData? network, ScalarTrace? scalar, NoiseParameters? noise, SweepSource source)
    {
        Network = network;
        Scalar = scalar;
        Noise = noise;
        Source = source;
        Grid = network?.Grid ?? scalar!.Grid;
    }

    /// <summary>The frequencies.</summary>
    public FrequencyGrid Grid { get; }

    /// <summary>S-parameters, when the sweep came from a network analyser.</summary>
    public NetworkData? Network { get; }

    /// <summary>Magnitude (and optional phase) trace, when the sweep is scalar.</summary>
    public ScalarTrace? Scalar { get; }

    /// <summary>Two-port noise parameters, when the file had them; kept apart from the network data.</summary>
    public NoiseParameters? Noise { get; }

    /// <summary>Where the sweep came from.</summary>
    public SweepSource Source { get; }

    /// <summary>Number of ports: that of the network data, or 2 for a scalar transmission trace.</summary>
    public int PortCount => Network?.PortCount ?? 2;

    /// <summary>A sweep of network data.</summary>
    public static Sweep FromNetwork(NetworkData network, SweepSource source, NoiseParameters? noise = null)
    {
        ArgumentNullException.ThrowIfNull(network);
        ArgumentNullException.ThrowIfNull(source);
        if (noise is not null && network.PortCount != 2)
        {
            throw new ArgumentException("noise parameters exist only for two-ports", nameof(noise));
        }
        return new Sweep(network, null, noise, source);
    }

    /// <summary>A sweep of a scalar trace.</summary>
    public static Sweep FromScalar(ScalarTrace scalar, SweepSource source)
    {
        ArgumentNullException.ThrowIfNull(scalar);
        ArgumentNullException.ThrowIfNull(source);
        return new Sweep(null, scalar, null, source);
    }
}
