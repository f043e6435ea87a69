using System.Globalization;
using System.Numerics;

namespace FilterQA.Core.Sweeps;

/// <summary>
/// n-port S-parameters over a frequency grid, with a reference impedance per port.
/// Ports are numbered from 1 as in S21 (to port 2, from port 1). Immutable.
/// </summary>
/// <remarks>
/// Storage is one array with each S<sub>ij</sub> trace contiguous, because measurements walk one
/// path (S21, S11) over all frequencies far more often than one frequency over all paths.
/// </remarks>
public sealed class NetworkData
{
    private readonly Complex[] _s;
    private readonly double[] _referenceOhm;

    private NetworkData(FrequencyGrid grid, int portCount, Complex[] s, double[] referenceOhm)
    {
        Grid = grid;
        PortCount = portCount;
        _s = s;
        _referenceOhm = referenceOhm;
    }

    /// <summary>The frequencies.</summary>
    public FrequencyGrid Grid { get; }

    /// <summary>Number of ports, at least 1.</summary>
    public int PortCount { get; }

    /// <summary>Reference impedance of each port, ohm (real, positive); index 0 is port 1.</summary>
    public ReadOnlySpan<double> ReferenceOhm => _referenceOhm;

    /// <summary>S<sub>to,from</sub> at every frequency, e.g. <c>Trace(2, 1)</c> is S21.</summary>
    /// <exception cref="ArgumentOutOfRangeException">A port number outside 1..PortCount.</exception>
    public ReadOnlySpan<Complex> Trace(int toPort, int fromPort)
    {
        int offset = TraceOffset(toPort, fromPort);
        return new ReadOnlySpan<Complex>(_s, offset, Grid.Count);
    }

    /// <summary>S<sub>to,from</sub> at point <paramref name="frequencyIndex"/>.</summary>
    public Complex this[int frequencyIndex, int toPort, int fromPort] => _s[TraceOffset(toPort, fromPort) + frequencyIndex];

    /// <summary>
    /// Makes network data from <paramref name="s"/> indexed [frequency, to − 1, from − 1] (copied).
    /// </summary>
    /// <exception cref="ArgumentException">Shapes disagree, a value is NaN or infinite, or a reference impedance is not positive and finite.</exception>
    public static NetworkData Create(FrequencyGrid grid, Complex[,,] s, ReadOnlySpan<double> referenceOhm)
    {
        ArgumentNullException.ThrowIfNull(grid);
        ArgumentNullException.ThrowIfNull(s);
        int n = s.GetLength(1);
        if (s.GetLength(0) != grid.Count || s.GetLength(2) != n || n < 1)
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                $"S must be [{grid.Count}, n, n] with n >= 1; got [{s.GetLength(0)}, {s.GetLength(1)}, {s.GetLength(2)}]"), nameof(s));
        }
        var flat = new Complex[n * n * grid.Count];
        for (int to = 0; to < n; to++)
        {
            for (int from = 0; from < n; from++)
            {
                int offset = (to * n + from) * grid.Count;
                for (int f = 0; f < grid.Count; f++)
                {
                    flat[offset + f] = s[f, to, from];
                }
            }
        }
        return Own(grid, n, flat, referenceOhm.ToArray());
    }

    /// <summary>
    /// Takes ownership of <paramref name="flatS"/> laid out as ((to − 1)·n + (from − 1))·F + f; validates it.
    /// </summary>
    internal static NetworkData Own(FrequencyGrid grid, int portCount, Complex[] flatS, double[] referenceOhm)
    {
        if (portCount < 1 || flatS.Length != portCount * portCount * grid.Count)
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                $"{portCount}-port data over {grid.Count} points needs {portCount * portCount * grid.Count} values; got {flatS.Length}"));
        }
        if (referenceOhm.Length != portCount)
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                $"{portCount}-port data needs {portCount} reference impedances; got {referenceOhm.Length}"), nameof(referenceOhm));
        }
        for (int p = 0; p < referenceOhm.Length; p++)
        {
            if (!double.IsFinite(referenceOhm[p]) || referenceOhm[p] <= 0)
            {
                throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                    $"reference impedance of port {p + 1} is {referenceOhm[p]} ohm; it must be positive and finite"), nameof(referenceOhm));
            }
        }
        for (int i = 0; i < flatS.Length; i++)
        {
            if (!double.IsFinite(flatS[i].Real) || !double.IsFinite(flatS[i].Imaginary))
            {
                int trace = i / grid.Count;
                throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                    $"S{trace / portCount + 1}{trace % portCount + 1} at index {i % grid.Count} is not finite ({flatS[i]})"), nameof(flatS));
            }
        }
        return new NetworkData(grid, portCount, flatS, referenceOhm);
    }

    private int TraceOffset(int toPort, int fromPort)
    {
        if (toPort < 1 || toPort > PortCount)
        {
            throw new ArgumentOutOfRangeException(nameof(toPort), toPort, $"port must be 1..{PortCount}");
        }
        if (fromPort < 1 || fromPort > PortCount)
        {
            throw new ArgumentOutOfRangeException(nameof(fromPort), fromPort, $"port must be 1..{PortCount}");
        }
        return ((toPort - 1) * PortCount + (fromPort - 1)) * Grid.Count;
    }
}
