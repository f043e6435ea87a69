using FilterQA.Core.Measurement;
using FilterQA.Core.Resonators;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;
using MeasurementBand = FilterQA.Core.Measurement.FrequencyBand;
using TemplateBand = FilterQA.Core.Templates.FrequencyBand;

namespace FilterQA.Core.Decisions;

/// <summary>
/// What the rules of one evaluation share, measured once: the minimum loss, band edges per level and search mode,
/// the measured centre, the noise floor estimate, and the resonator and trap analyses (made on first use).
/// </summary>
internal sealed class EvaluationContext
{
    private readonly List<LevelBandwidth> _innermost = new(4);
    private readonly List<LevelBandwidth> _outermost = new(4);
    private double? _measuredCentreHz;
    private bool _floorEstimated;
    private NoiseFloorEstimate? _floorEstimate;
    private ResonatorMeasurement? _resonator;
    private TrapMeasurement? _trap;

    public EvaluationContext(LimitTemplate template, MeasurementInput input)
    {
        Template = template;
        Input = input;
        Trace = input.Primary;
        IsTransmission = Trace.Path == ResponsePath.Transmission;
        MinIndex = Loss.MinimumIndex(Trace.LossDb);
        MinLossDb = Trace.LossDb[MinIndex];
    }

    public LimitTemplate Template { get; }

    public MeasurementInput Input { get; }

    public ResponseTrace Trace { get; }

    public bool IsTransmission { get; }

    public ReadOnlySpan<double> Hz => Trace.Grid.Hz;

    public ReadOnlySpan<double> LossDb => Trace.LossDb;

    /// <summary>Index of the sampled minimum-loss point of the main trace.</summary>
    public int MinIndex { get; }

    /// <summary>The minimum loss of the main trace, dB: the reference of every relative level.</summary>
    public double MinLossDb { get; }

    /// <summary>Warnings of the measurements, in the order found.</summary>
    public List<MeasurementWarning> Warnings { get; } = [];

    /// <summary>The edges at a relative level, innermost or outermost, measured once per evaluation.</summary>
    public LevelBandwidth Edges(double levelDb, EdgeSearch search)
    {
        List<LevelBandwidth> cache = search == EdgeSearch.Innermost ? _innermost : _outermost;
        foreach (LevelBandwidth known in cache)
        {
            if (known.LevelDb == levelDb)
            {
                return known;
            }
        }
        LevelBandwidth found = BandEdges.Find(Hz, LossDb, MinIndex, levelDb, search, null);
        cache.Add(found);
        return found;
    }

    /// <summary>
    /// The centre measured on this unit, Hz, that measured-offset bands follow; NaN when it cannot be measured.
    /// Bandpass: the centre of the template's first centre-frequency rule (its level and method), else the arithmetic
    /// centre of the innermost 3 dB edges. Resonator: the fitted series resonance. Band-stop: the notch frequency.
    /// </summary>
    public double MeasuredCentreHz => _measuredCentreHz ??= FindCentre();

    private double FindCentre()
    {
        switch (Template.Device)
        {
            case DeviceKind.Resonator:
                return Resonator.SeriesHz ?? double.NaN;
            case DeviceKind.BandStop:
                return IsTransmission && Trap.DepthDb is not null ? Trap.NotchHz : double.NaN;
            default:
                if (!IsTransmission)
                {
                    return double.NaN;
                }
                var rule = Template.Rules.OfType<Templates.Rules.CentreFrequencyRule>().FirstOrDefault();
                LevelBandwidth edges = Edges(rule?.LevelDb ?? 3, EdgeSearch.Innermost);
                double? centre = rule?.Method == CentreMethod.GeometricMean ? edges.GeometricCentreHz : edges.CentreHz;
                return centre ?? double.NaN;
        }
    }

    /// <summary>A template band in absolute hertz for this unit; null when it cannot be placed (unknown measured centre, or below 0 Hz).</summary>
    public MeasurementBand? Resolve(TemplateBand band)
    {
        (double start, double stop) = band.Resolve(Template.NominalHz, band.Anchor == FrequencyAnchor.MeasuredOffset ? MeasuredCentreHz : double.NaN);
        return double.IsFinite(start) && double.IsFinite(stop) && start >= 0 ? new MeasurementBand(start, stop) : null;
    }

    /// <summary>Why a band cannot be read on this sweep, or null when it can: it must be placed, covered by the sweep and hold a point.</summary>
    public string? BandProblem(TemplateBand band, MeasurementBand? resolved, string what)
    {
        if (resolved is null)
        {
            return band.Anchor == FrequencyAnchor.MeasuredOffset
                ? $"the {what} follows the measured centre, which could not be measured on this unit"
                : $"the {what} lies below 0 Hz";
        }
        ReadOnlySpan<double> f = Hz;
        if (!resolved.IsCoveredBy(f[0], f[^1]))
        {
            return $"the {what} {Say.Hz(resolved.StartHz)} to {Say.Hz(resolved.StopHz)} reaches beyond the sweep {Say.Hz(f[0])} to {Say.Hz(f[^1])}";
        }
        return BandIndexRange.Of(f, resolved).Count == 0
            ? $"the {what} {Say.Hz(resolved.StartHz)} to {Say.Hz(resolved.StopHz)} holds no sweep point"
            : null;
    }

    /// <summary>The noise floor estimated from the sweep (once; with its warning); null when a floor trace was given or the sweep is too short.</summary>
    public NoiseFloorEstimate? EstimatedFloor
    {
        get
        {
            if (!_floorEstimated)
            {
                _floorEstimated = true;
                _floorEstimate = Input.HasFloor ? null : StopbandRejection.EstimateWithWarning(Hz, LossDb, Warnings);
            }
            return _floorEstimate;
        }
    }

    /// <summary>
    /// The floor at point <paramref name="index"/> as a loss, dB: the floor trace, or an estimate that saw noise; null
    /// otherwise. An estimate that saw no noise only says the floor is deeper than the deepest part of the sweep, which
    /// for a trap is the notch itself, so it must not mark that part as floor-limited.
    /// </summary>
    public double? FloorAt(int index) => Input.HasFloor ? Input.FloorLossDb[index] : EstimatedFloor is { NoiseSeen: true } seen ? seen.LossDb : null;

    /// <summary>The resonator analysis (fitted once): of the thru-normalised trace when a thru was used, else of the sweep itself.</summary>
    public ResonatorMeasurement Resonator => _resonator ??= MeasureResonator();

    private ResonatorMeasurement MeasureResonator()
    {
        if (Input.IsNormalisedByThru)
        {
            double z0 = Input.Sweep.Network?.ReferenceOhm[0] ?? ResonatorOptions.Default.ScalarReferenceOhm;
            return ResonatorAnalyzer.Measure(Trace, z0, IsTransmission ? ResonatorFixture.SeriesThrough : ResonatorFixture.OnePortReflection);
        }
        return ResonatorAnalyzer.Measure(Input.Sweep);
    }

    /// <summary>The trap analysis of the main (transmission) trace, made once.</summary>
    public TrapMeasurement Trap => _trap ??= TrapAnalyzer.Measure(Trace);
}
