using System.Globalization;
using MathNet.Numerics.Distributions;

namespace FilterQA.Core.Statistics;

/// <summary>Capability indices Cp, Cpu, Cpl, Cpk with the Bissell lower confidence bound.</summary>
public static class ProcessCapability
{
    /// <summary>d2 for moving ranges of two consecutive values.</summary>
    public const double D2ForMovingRangeOfTwo = 1.128;

    /// <summary>Indices from a mean and a standard deviation already estimated.</summary>
    /// <param name="mean">μ, parameter unit; finite.</param>
    /// <param name="sigma">σ, parameter unit; finite and &gt; 0.</param>
    /// <param name="count">n the estimates rest on, at least 2 (the bound divides by n − 1).</param>
    /// <param name="limits">Specification limits.</param>
    /// <param name="basis">Where σ came from (only recorded).</param>
    /// <param name="confidence">Confidence of the lower bound, strictly between 0 and 1; default 0.95.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value out of range or NaN.</exception>
    public static CapabilityIndices Compute(double mean, double sigma, int count, SpecLimits limits, SigmaBasis basis = SigmaBasis.OverallSample, double confidence = 0.95)
    {
        ArgumentNullException.ThrowIfNull(limits);
        if (!double.IsFinite(mean))
        {
            throw new ArgumentOutOfRangeException(nameof(mean), mean, "the mean must be finite");
        }
        if (!(sigma > 0) || !double.IsFinite(sigma))
        {
            throw new ArgumentOutOfRangeException(nameof(sigma), sigma, "the standard deviation must be finite and above 0 (capability is undefined for zero spread)");
        }
        if (count < 2)
        {
            throw new ArgumentOutOfRangeException(nameof(count), count, "capability needs at least 2 values (30 or more in practice)");
        }
        if (!(confidence > 0 && confidence < 1))
        {
            throw new ArgumentOutOfRangeException(nameof(confidence), confidence, "the confidence must be strictly between 0 and 1 (0.95 = 95 %)");
        }
        double? cpu = limits.Upper is { } usl ? (usl - mean) / (3 * sigma) : null;
        double? cpl = limits.Lower is { } lsl ? (mean - lsl) / (3 * sigma) : null;
        double? cp = limits.IsTwoSided ? (limits.Upper!.Value - limits.Lower!.Value) / (6 * sigma) : null;
        double cpk = Math.Min(cpu ?? double.PositiveInfinity, cpl ?? double.PositiveInfinity);
        double ppm = 1e6 * ((cpu is { } u ? Normal.CDF(0, 1, -3 * u) : 0) + (cpl is { } l ? Normal.CDF(0, 1, -3 * l) : 0));
        return new CapabilityIndices(mean, sigma, count, basis, cp, cpu, cpl, cpk, confidence, BissellLowerBound(cpk, count, confidence), ppm);
    }

    /// <summary>Indices from values (in production order when <paramref name="basis"/> is <see cref="SigmaBasis.MovingRange"/>).</summary>
    /// <param name="values">Measured values, parameter unit; at least 2, all finite.</param>
    /// <param name="limits">Specification limits.</param>
    /// <param name="basis">σ source; default the overall sample s.</param>
    /// <param name="givenSigma">σ_within when <paramref name="basis"/> is <see cref="SigmaBasis.Given"/>; otherwise must be null.</param>
    /// <param name="confidence">Confidence of the lower bound; default 0.95.</param>
    /// <exception cref="ArgumentException">Fewer than 2 values, a NaN or infinite value (index named), zero spread, or a given σ missing/unexpected.</exception>
    public static CapabilityIndices FromSample(ReadOnlySpan<double> values, SpecLimits limits, SigmaBasis basis = SigmaBasis.OverallSample, double? givenSigma = null, double confidence = 0.95)
    {
        SampleMoments moments = SampleMoments.Of(values);
        if (basis == SigmaBasis.Given != givenSigma.HasValue)
        {
            throw new ArgumentException("give sigma exactly when the basis is Given", nameof(givenSigma));
        }
        double sigma = basis switch
        {
            SigmaBasis.OverallSample => moments.StandardDeviation,
            SigmaBasis.MovingRange => MovingRangeSigma(values),
            SigmaBasis.Given => givenSigma!.Value,
            _ => throw new ArgumentOutOfRangeException(nameof(basis), basis, "not a defined sigma basis"),
        };
        return Compute(moments.Mean, sigma, values.Length, limits, basis, confidence);
    }

    /// <summary>σ_within = MR̄/1.128, MR̄ the mean of |x_i − x_{i−1}| over consecutive values (production order).</summary>
    /// <exception cref="ArgumentException">Fewer than 2 values, or a value NaN or infinite (index named).</exception>
    public static double MovingRangeSigma(ReadOnlySpan<double> values)
    {
        SampleMoments.CheckValues(values, 2);
        double sum = 0;
        for (int i = 1; i < values.Length; i++)
        {
            sum += Math.Abs(values[i] - values[i - 1]);
        }
        return sum / (values.Length - 1) / D2ForMovingRangeOfTwo;
    }

    /// <summary>Bissell (1990) approximate lower confidence bound of Cpk: Ĉpk − z_{1−α}·√(1/(9n) + Ĉpk²/(2(n − 1))).</summary>
    /// <param name="cpk">Estimated Cpk.</param>
    /// <param name="count">n ≥ 2.</param>
    /// <param name="confidence">1 − α, strictly between 0 and 1.</param>
    /// <exception cref="ArgumentOutOfRangeException">n below 2, confidence out of range, Cpk not finite.</exception>
    public static double BissellLowerBound(double cpk, int count, double confidence)
    {
        if (!double.IsFinite(cpk))
        {
            throw new ArgumentOutOfRangeException(nameof(cpk), cpk, "Cpk must be finite");
        }
        if (count < 2)
        {
            throw new ArgumentOutOfRangeException(nameof(count), count, "the bound needs n >= 2");
        }
        if (!(confidence > 0 && confidence < 1))
        {
            throw new ArgumentOutOfRangeException(nameof(confidence), confidence, "the confidence must be strictly between 0 and 1");
        }
        double z = Normal.InvCDF(0, 1, confidence);
        return cpk - z * Math.Sqrt(1.0 / (9.0 * count) + cpk * cpk / (2.0 * (count - 1)));
    }

    /// <summary>Parts per million beyond one limit of a normal process with that one-sided index: 10⁶·Φ(−3·index).</summary>
    /// <exception cref="ArgumentOutOfRangeException">Index NaN.</exception>
    public static double OneSidedPpm(double index)
    {
        if (double.IsNaN(index))
        {
            throw new ArgumentOutOfRangeException(nameof(index), index, "the index must be a number");
        }
        return 1e6 * Normal.CDF(0, 1, -3 * index);
    }
}
