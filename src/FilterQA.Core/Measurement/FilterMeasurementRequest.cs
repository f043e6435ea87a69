using System.Collections.ObjectModel;

namespace FilterQA.Core.Measurement;

/// <summary>What <see cref="FilterMeasurer.Measure"/> should measure. Immutable; each property is validated when set.</summary>
public sealed record FilterMeasurementRequest
{
    private readonly ReadOnlyCollection<double> _levelsDb = Array.AsReadOnly(new double[] { 3, 6 });
    private readonly ReadOnlyCollection<FrequencyBand> _stopbands = Array.AsReadOnly(Array.Empty<FrequencyBand>());
    private readonly double? _resolutionBandwidthHz;

    /// <summary>
    /// Levels, dB below the minimum-loss point, at which to find band edges (innermost crossings); each finite and &gt; 0;
    /// results come in this order. Default 3 and 6 dB. An empty list measures no bands.
    /// </summary>
    /// <exception cref="ArgumentException">Null, or a level is not finite or not above 0 (the message names its index).</exception>
    public IReadOnlyList<double> LevelsDb
    {
        get => _levelsDb;
        init
        {
            ArgumentNullException.ThrowIfNull(value);
            var copy = new double[value.Count];
            for (int i = 0; i < copy.Length; i++)
            {
                double level = value[i];
                if (!double.IsFinite(level) || level <= 0)
                {
                    throw new ArgumentException($"level {Warnings.N(i)} is {Warnings.N(level)} dB; levels must be finite and above 0 dB", nameof(LevelsDb));
                }
                copy[i] = level;
            }
            _levelsDb = Array.AsReadOnly(copy);
        }
    }

    /// <summary>Band over which the passband ripple is read; null for no ripple reading.</summary>
    public FrequencyBand? RippleBand { get; init; }

    /// <summary>Stopbands to read the rejection over; default none.</summary>
    /// <exception cref="ArgumentException">Null, or an element is null (the message names its index).</exception>
    public IReadOnlyList<FrequencyBand> Stopbands
    {
        get => _stopbands;
        init
        {
            ArgumentNullException.ThrowIfNull(value);
            var copy = new FrequencyBand[value.Count];
            for (int i = 0; i < copy.Length; i++)
            {
                copy[i] = value[i] ?? throw new ArgumentException($"stopband {Warnings.N(i)} is null", nameof(Stopbands));
            }
            _stopbands = Array.AsReadOnly(copy);
        }
    }

    /// <summary>Resolution bandwidth of the analyser for a stepped-generator sweep, Hz (finite, &gt; 0); null for a network analyser.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not finite or not above 0.</exception>
    public double? ResolutionBandwidthHz
    {
        get => _resolutionBandwidthHz;
        init
        {
            SweepAdequacy.CheckRbw(value, nameof(ResolutionBandwidthHz));
            _resolutionBandwidthHz = value;
        }
    }
}
