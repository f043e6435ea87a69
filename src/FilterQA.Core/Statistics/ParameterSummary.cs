namespace FilterQA.Core.Statistics;

/// <summary>Statistics of one measured parameter over a lot: moments, histogram and capability.</summary>
public sealed class ParameterSummary
{
    private ParameterSummary(string parameter, string unit, SampleMoments moments, Histogram histogram, SpecLimits? limits, CapabilityIndices? capability, string? capabilityNote)
    {
        Parameter = parameter;
        Unit = unit;
        Moments = moments;
        Histogram = histogram;
        Limits = limits;
        Capability = capability;
        CapabilityNote = capabilityNote;
    }

    /// <summary>Parameter name (e.g. "CentreHz").</summary>
    public string Parameter { get; }

    /// <summary>SI unit symbol of the values (e.g. "Hz", "dB"); may be empty for dimensionless values.</summary>
    public string Unit { get; }

    /// <summary>Count, mean, s (n − 1), minimum, maximum.</summary>
    public SampleMoments Moments { get; }

    /// <summary>Histogram of the values.</summary>
    public Histogram Histogram { get; }

    /// <summary>Limits the capability was computed against, or null.</summary>
    public SpecLimits? Limits { get; }

    /// <summary>Capability, or null when there are no limits, fewer than 2 values, or zero spread (see <see cref="CapabilityNote"/>).</summary>
    public CapabilityIndices? Capability { get; }

    /// <summary>Why <see cref="Capability"/> is null; null when it is present.</summary>
    public string? CapabilityNote { get; }

    /// <summary>Summarises values of one parameter, in measurement (production) order.</summary>
    /// <param name="parameter">Parameter name; not empty.</param>
    /// <param name="unit">SI unit symbol; may be empty.</param>
    /// <param name="values">Valid measured values; at least 1, all finite (leave out units not measured).</param>
    /// <param name="limits">Specification limits, or null for statistics without capability.</param>
    /// <param name="options">Choices; null for the defaults.</param>
    /// <exception cref="ArgumentException">Empty name, no values, a NaN or infinite value (index named), or bad options.</exception>
    public static ParameterSummary Compute(string parameter, string unit, ReadOnlySpan<double> values, SpecLimits? limits, SummaryOptions? options = null)
    {
        ArgumentException.ThrowIfNullOrEmpty(parameter);
        ArgumentNullException.ThrowIfNull(unit);
        options ??= new SummaryOptions();
        SampleMoments moments = SampleMoments.Of(values);
        Histogram histogram = options.BinEdges is { } edges
            ? Histogram.FromEdges(values, edges.ToArray())
            : Histogram.Create(values, options.BinRule);

        CapabilityIndices? capability = null;
        string? note = null;
        if (limits is null)
        {
            note = "no specification limits";
        }
        else if (values.Length < 2)
        {
            note = "fewer than 2 values";
        }
        else if (options.Sigma == SigmaBasis.OverallSample && !(moments.StandardDeviation > 0))
        {
            note = "all values equal: zero spread, capability undefined";
        }
        else if (options.Sigma == SigmaBasis.MovingRange && !(ProcessCapability.MovingRangeSigma(values) > 0))
        {
            note = "no moving range: zero spread, capability undefined";
        }
        else
        {
            capability = ProcessCapability.FromSample(values, limits, options.Sigma, options.GivenSigma, options.Confidence);
        }
        return new ParameterSummary(parameter, unit, moments, histogram, limits, capability, note);
    }
}
