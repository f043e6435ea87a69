using System.Collections.Immutable;

namespace FilterQA.Core.Templates.Rules;

/// <summary>
/// A free limit line: a piecewise-linear boundary through (frequency, loss) points, linear in dB against
/// frequency between points and undefined outside the first and last point. The dB are LOSS (positive for
/// attenuation), relative to the minimum loss or absolute (<see cref="Reference"/>). An upper boundary is a
/// maximum loss, a lower boundary a minimum loss. Any device kind.
/// </summary>
public sealed record LimitLineRule : LimitRule
{
    private readonly ImmutableArray<double> _frequenciesHz;
    private readonly ImmutableArray<double> _lossDb;

    /// <summary>Makes the rule from copies of the points.</summary>
    /// <param name="id">Short name.</param>
    /// <param name="title">Plain-words title.</param>
    /// <param name="boundary">Upper (maximum loss) or lower (minimum loss).</param>
    /// <param name="anchor">What the point frequencies are measured from.</param>
    /// <param name="reference">Relative to the minimum loss, or absolute.</param>
    /// <param name="frequenciesHz">Point frequencies, Hz, strictly increasing, at least two (absolute ones not negative).</param>
    /// <param name="lossDb">Loss at each point, dB, zero or more.</param>
    /// <param name="uncertaintyDb">U (k = 2) of the loss, dB.</param>
    /// <exception cref="ArgumentException">Fewer than two points, lengths differ, a value not finite, frequencies not strictly increasing, or a negative loss.</exception>
    public LimitLineRule(string id, string title, LimitBoundary boundary, FrequencyAnchor anchor, LossReference reference,
        ReadOnlySpan<double> frequenciesHz, ReadOnlySpan<double> lossDb, double uncertaintyDb)
        : base(id, title, uncertaintyDb)
    {
        Boundary = Checks.Defined(boundary, "the boundary");
        Anchor = Checks.Defined(anchor, "the frequency anchor");
        Reference = Checks.Defined(reference, "the loss reference");
        if (frequenciesHz.Length != lossDb.Length)
        {
            throw new ArgumentException(Checks.Say($"a limit line has {frequenciesHz.Length} frequencies but {lossDb.Length} losses"));
        }
        if (frequenciesHz.Length < 2)
        {
            throw new ArgumentException("a limit line needs at least two points");
        }
        for (int i = 0; i < frequenciesHz.Length; i++)
        {
            Checks.Finite(frequenciesHz[i], Checks.Say($"the frequency of point {i + 1}"));
            Checks.NonNegative(lossDb[i], Checks.Say($"the loss of point {i + 1}"));
            if (i > 0 && frequenciesHz[i] <= frequenciesHz[i - 1])
            {
                throw new ArgumentException(Checks.Say($"the frequency of point {i + 1} ({frequenciesHz[i]:R} Hz) must be above that of point {i} ({frequenciesHz[i - 1]:R} Hz)"));
            }
        }
        if (anchor == FrequencyAnchor.Absolute && frequenciesHz[0] < 0)
        {
            throw new ArgumentException(Checks.Say($"an absolute limit line cannot start at a negative frequency ({frequenciesHz[0]:R} Hz)"));
        }
        _frequenciesHz = [.. frequenciesHz];
        _lossDb = [.. lossDb];
    }

    /// <summary>Upper (maximum loss) or lower (minimum loss).</summary>
    public LimitBoundary Boundary { get; }

    /// <summary>What the point frequencies are measured from.</summary>
    public FrequencyAnchor Anchor { get; }

    /// <summary>Relative to the minimum loss, or absolute.</summary>
    public LossReference Reference { get; }

    /// <summary>Point frequencies, Hz (absolute or offsets per <see cref="Anchor"/>), strictly increasing.</summary>
    public ImmutableArray<double> FrequenciesHz => _frequenciesHz;

    /// <summary>Loss at each point, dB, positive for attenuation.</summary>
    public ImmutableArray<double> LossDb => _lossDb;

    /// <summary>
    /// The boundary at <paramref name="frequencyHz"/> (same anchor as the points), dB of loss, by linear
    /// interpolation between the neighbouring points; NaN outside the first..last point or for NaN input.
    /// </summary>
    public double BoundaryDbAt(double frequencyHz)
    {
        if (!(frequencyHz >= _frequenciesHz[0] && frequencyHz <= _frequenciesHz[^1]))
        {
            return double.NaN;
        }
        int upper = 1;
        while (_frequenciesHz[upper] < frequencyHz)
        {
            upper++;
        }
        double f1 = _frequenciesHz[upper - 1], f2 = _frequenciesHz[upper];
        double a1 = _lossDb[upper - 1], a2 = _lossDb[upper];
        return a1 + (frequencyHz - f1) * (a2 - a1) / (f2 - f1);
    }

    /// <inheritdoc/>
    public override RuleKind Kind => RuleKind.LimitLine;

    /// <inheritdoc/>
    public override RuleUnit Unit => RuleUnit.Decibel;

    /// <inheritdoc/>
    public override bool FitsDevice(DeviceKind device) => Enum.IsDefined(device);

    internal override (FrequencyAnchor Anchor, double StartHz, double StopHz)? Extent => (Anchor, _frequenciesHz[0], _frequenciesHz[^1]);

    /// <summary>Equal when every field and every point is equal.</summary>
    public bool Equals(LimitLineRule? other) =>
        other is not null && base.Equals(other) && Boundary == other.Boundary && Anchor == other.Anchor
        && Reference == other.Reference && _frequenciesHz.AsSpan().SequenceEqual(other._frequenciesHz.AsSpan())
        && _lossDb.AsSpan().SequenceEqual(other._lossDb.AsSpan());

    /// <inheritdoc/>
    public override int GetHashCode()
    {
        var hash = new HashCode();
        hash.Add(base.GetHashCode());
        hash.Add(Boundary);
        hash.Add(Anchor);
        hash.Add(Reference);
        foreach (double f in _frequenciesHz)
        {
            hash.Add(f);
        }
        foreach (double a in _lossDb)
        {
            hash.Add(a);
        }
        return hash.ToHashCode();
    }
}
