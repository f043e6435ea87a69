using System.Globalization;
using System.Numerics;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Synthesis;

/// <summary>
/// Makes realistic synthetic sweeps of the demo parts (<see cref="DemoParts"/>): two-port S-parameters as a
/// network analyser would give them, and power traces (thru, unit, noise floor) as a stepped generator and a
/// spectrum analyser would. Seeded and deterministic: the same seed, part, serial and defect always give the
/// same values, bit for bit, whatever else was generated before.
/// </summary>
/// <remarks>
/// <para>For demos, screenshots and load tests only. A synthetic sweep must never supply the expected value of a
/// correctness test; those are computed from published formulas, standards and worked examples.</para>
/// <para>Per-unit randomness comes from a 64-bit key made from (seed, stable hash of the part number, serial
/// index), split into independent streams for the unit's parameters and for measurement noise; the generator is
/// xoshiro256** with Box–Muller normals, not <see cref="Random"/>, so values do not change with the .NET version.</para>
/// <para>Thread safety: an instance holds only its seed; calls may run concurrently.</para>
/// </remarks>
public sealed class UnitSynthesiser
{
    /// <summary>RMS of the complex noise added to S21 and S12, dB below a thru (|S21| = 1): deep stopbands flatten into it.</summary>
    public const double NetworkNoiseFloorDb = 95;

    /// <summary>Nominal generator level reaching the analyser through a thru, dBm.</summary>
    public const double ThruLevelDbm = -10;

    /// <summary>Largest deviation of a station's thru trace from <see cref="ThruLevelDbm"/> (offset plus cable ripple), dB.</summary>
    public const double ThruRippleDb = 0.2;

    /// <summary>Mean displayed noise level of the spectrum analyser at the demo settings, dBm (95 dB below the thru).</summary>
    public const double AnalyserNoiseFloorDbm = -105;

    private const ulong ParameterStream = 1, NetworkNoiseStream = 2, LotStream = 3, ThruShapeStream = 4,
        ThruJitterStream = 5, UnitJitterStream = 6, FloorStream = 7;

    // Scale of the independent per-point level jitter of power traces, dB (analyser amplitude repeatability).
    private const double PowerJitterDb = 0.005;

    // Each floor point is the mean of this many exponential noise-power samples (video averaging).
    private const int FloorAveraging = 8;

    /// <summary>A synthesiser whose every output is fixed by <paramref name="seed"/>.</summary>
    public UnitSynthesiser(ulong seed) => Seed = seed;

    /// <summary>The seed given at construction.</summary>
    public ulong Seed { get; }

    /// <summary>The serial printed for an index: "S" and at least four digits, e.g. 1 → "S0001".</summary>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="serialIndex"/> below 1.</exception>
    public static string Serial(int serialIndex)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(serialIndex, 1);
        return string.Create(CultureInfo.InvariantCulture, $"S{serialIndex:D4}");
    }

    /// <summary>
    /// One unit as a network analyser measures it: 2-port S11, S21, S12 (= S21, reciprocal), S22 on
    /// <see cref="DemoPart.Grid"/>, referenced to <see cref="DemoPart.ReferenceOhm"/>, with complex noise
    /// <see cref="NetworkNoiseFloorDb"/> below a thru on S21/S12 (reflections are noise-free). Every column is
    /// passive: |S11|² + |S21|² ≤ 1 and |S22|² + |S12|² ≤ 1 at every point. Source: format
    /// <see cref="SweepFormat.Synthetic"/>, file name like <c>TME-CF455-15_S0001.s2p</c>.
    /// </summary>
    /// <param name="part">A demo part.</param>
    /// <param name="serialIndex">Serial index, 1 or more.</param>
    /// <param name="defect">Defect to build in; must be <see cref="DefectKind.None"/> or one of <see cref="DemoPart.Defects"/>.</param>
    /// <exception cref="ArgumentNullException"><paramref name="part"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="serialIndex"/> below 1.</exception>
    /// <exception cref="ArgumentException"><paramref name="defect"/> does not apply to the part.</exception>
    public Sweep Unit(DemoPart part, int serialIndex, DefectKind defect = DefectKind.None)
    {
        CheckUnit(part, serialIndex, defect);
        int n = part.Grid.Count;
        var flat = new Complex[4 * n];
        Span<Complex> s11 = flat.AsSpan(0, n), s12 = flat.AsSpan(n, n), s21 = flat.AsSpan(2 * n, n), s22 = flat.AsSpan(3 * n, n);
        ulong key = UnitKey(part, serialIndex);
        DeterministicRandom parameters = ParameterRandom(part, serialIndex);
        part.Design.Synthesise(part.Grid, ref parameters, defect, s11, s21, s22);

        var noise = new DeterministicRandom(StableHash.Combine(key, NetworkNoiseStream));
        double sigma = Math.Pow(10, -NetworkNoiseFloorDb / 20) / Math.Sqrt(2);
        for (int i = 0; i < n; i++)
        {
            s21[i] += new Complex(sigma * noise.NextNormal(), sigma * noise.NextNormal());
        }
        s21.CopyTo(s12);

        string serial = Serial(serialIndex);
        var source = new SweepSource(part.PartNumber + "_" + serial + ".s2p", SweepFormat.Synthetic, "", Notes(part, serial), []);
        return Sweep.FromNetwork(NetworkData.Own(part.Grid, 2, flat, part.ReferenceOhms), source);
    }

    /// <summary>
    /// <paramref name="count"/> units with serial indices from <paramref name="firstSerialIndex"/>, of which
    /// round(count · <paramref name="defectShare"/>) (half away from zero) are defective. Which serials are
    /// defective, and with which kind, is drawn from (seed, part, first index, count); each unit's sweep is
    /// exactly <see cref="Unit"/> of its serial and defect. Generated lazily, one unit per step.
    /// </summary>
    /// <param name="part">A demo part.</param>
    /// <param name="count">Number of units, 0 or more.</param>
    /// <param name="defectShare">Share of defective units, 0..1.</param>
    /// <param name="defectKinds">Kinds to choose from (uniformly per defective unit); null for all of <see cref="DemoPart.Defects"/>.</param>
    /// <param name="firstSerialIndex">Serial index of the first unit, 1 or more.</param>
    /// <exception cref="ArgumentNullException"><paramref name="part"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">count negative, share NaN or outside 0..1, first index below 1 or the last index past <see cref="int.MaxValue"/>.</exception>
    /// <exception cref="ArgumentException">A kind is <see cref="DefectKind.None"/> or does not apply to the part, or the list is empty while the share is above 0.</exception>
    public IEnumerable<SyntheticUnit> Lot(DemoPart part, int count, double defectShare,
        IReadOnlyList<DefectKind>? defectKinds = null, int firstSerialIndex = 1)
    {
        ArgumentNullException.ThrowIfNull(part);
        ArgumentOutOfRangeException.ThrowIfNegative(count);
        if (!(defectShare >= 0 && defectShare <= 1))
        {
            throw new ArgumentOutOfRangeException(nameof(defectShare), defectShare, "the share of defective units must be 0..1");
        }
        ArgumentOutOfRangeException.ThrowIfLessThan(firstSerialIndex, 1);
        if (count > 0 && firstSerialIndex > int.MaxValue - (count - 1))
        {
            throw new ArgumentOutOfRangeException(nameof(count), count, $"serial indices from {firstSerialIndex} would pass {int.MaxValue}");
        }
        DefectKind[] kinds = [.. defectKinds ?? part.Defects];
        foreach (DefectKind kind in kinds)
        {
            if (kind == DefectKind.None || !part.Defects.Contains(kind))
            {
                throw new ArgumentException(
                    $"defect kind {kind} does not apply to {part.PartNumber}; it can have {string.Join(", ", part.Defects)}", nameof(defectKinds));
            }
        }
        int defective = (int)Math.Round(count * defectShare, MidpointRounding.AwayFromZero);
        if (defective > 0 && kinds.Length == 0)
        {
            throw new ArgumentException("no defect kinds to choose from, but the share of defective units is above 0", nameof(defectKinds));
        }
        return LotUnits(part, count, defective, kinds, firstSerialIndex);
    }

    private IEnumerable<SyntheticUnit> LotUnits(DemoPart part, int count, int defective, DefectKind[] kinds, int firstSerialIndex)
    {
        // Partial Fisher–Yates: the first `defective` slots of the shuffled positions get a defect.
        var random = new DeterministicRandom(StableHash.Combine(StableHash.Combine(UnitKey(part, firstSerialIndex), LotStream), (ulong)count));
        var assigned = new DefectKind[count];
        if (defective > 0)
        {
            var positions = new int[count];
            for (int i = 0; i < count; i++)
            {
                positions[i] = i;
            }
            for (int i = 0; i < defective; i++)
            {
                int j = i + (int)(random.NextDouble() * (count - i));
                (positions[i], positions[j]) = (positions[j], positions[i]);
                assigned[positions[i]] = kinds[(int)(random.NextDouble() * kinds.Length)];
            }
        }
        for (int i = 0; i < count; i++)
        {
            int index = firstSerialIndex + i;
            yield return new SyntheticUnit(Serial(index), index, assigned[i], Unit(part, index, assigned[i]));
        }
    }

    /// <summary>
    /// A station's thru for this part, as a spectrum analyser reads the stepped generator through the fixture
    /// with a thru line in place: a power trace in dBm on <see cref="DemoPart.Grid"/>, within
    /// <see cref="ThruRippleDb"/> (plus a few thousandths of a dB of jitter) of <see cref="ThruLevelDbm"/>.
    /// The ripple is fixed by (seed, station, part); the jitter is independent of every other trace.
    /// </summary>
    /// <param name="part">A demo part.</param>
    /// <param name="station">Station name, e.g. "IQC-1"; not empty.</param>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="station"/> is empty or white space.</exception>
    public Sweep PowerThru(DemoPart part, string station)
    {
        CheckStation(part, station);
        double[] level = ThruShapeDbm(part, station);
        var jitter = new DeterministicRandom(StableHash.Combine(StationKey(part, station), ThruJitterStream));
        for (int i = 0; i < level.Length; i++)
        {
            level[i] += PowerJitterDb * jitter.NextTruncatedNormal();
        }
        return PowerSweep(part, level, station + "_" + part.PartNumber + "_thru.csv", "thru");
    }

    /// <summary>
    /// A unit measured the scalar way at a station: the analyser reads the station's thru level (the same
    /// ripple as <see cref="PowerThru"/>) plus the unit's gain 20·log10|S21| (the same unit as
    /// <see cref="Unit"/>, before network-analyser noise), power-added to the analyser's noise floor; dBm on
    /// <see cref="DemoPart.Grid"/>. Subtracting the thru trace recovers the unit's gain to within the traces'
    /// jitter wherever the signal stands well above <see cref="AnalyserNoiseFloorDbm"/>.
    /// </summary>
    /// <param name="part">A demo part.</param>
    /// <param name="serialIndex">Serial index, 1 or more.</param>
    /// <param name="station">Station name, not empty.</param>
    /// <param name="defect">As for <see cref="Unit"/>.</param>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="serialIndex"/> below 1.</exception>
    /// <exception cref="ArgumentException">Empty station, or a defect that does not apply to the part.</exception>
    public Sweep PowerUnit(DemoPart part, int serialIndex, string station, DefectKind defect = DefectKind.None)
    {
        CheckUnit(part, serialIndex, defect);
        CheckStation(part, station);
        int n = part.Grid.Count;
        var scratch = new Complex[3 * n];
        Span<Complex> s11 = scratch.AsSpan(0, n), s21 = scratch.AsSpan(n, n), s22 = scratch.AsSpan(2 * n, n);
        ulong key = UnitKey(part, serialIndex);
        DeterministicRandom parameters = ParameterRandom(part, serialIndex);
        part.Design.Synthesise(part.Grid, ref parameters, defect, s11, s21, s22);

        double[] level = ThruShapeDbm(part, station);
        var jitter = new DeterministicRandom(StableHash.Combine(StableHash.Combine(key, UnitJitterStream), StableHash.Of(station)));
        var floor = new DeterministicRandom(StableHash.Combine(StableHash.Combine(key, FloorStream), StableHash.Of(station)));
        for (int i = 0; i < n; i++)
        {
            double signalMw = Math.Pow(10, (level[i] + PowerJitterDb * jitter.NextTruncatedNormal()) / 10) * MagnitudeSquared(s21[i]);
            level[i] = 10 * Math.Log10(signalMw + FloorMw(part, i, ref floor));
        }
        string serial = Serial(serialIndex);
        return PowerSweep(part, level, part.PartNumber + "_" + serial + "_" + station + ".csv", "unit " + serial);
    }

    /// <summary>
    /// The analyser's noise floor at a station with the fixture terminated and no part: dBm on
    /// <see cref="DemoPart.Grid"/>, mean <see cref="AnalyserNoiseFloorDbm"/> with a gentle tilt of up to
    /// ±0.5 dB across the grid and the fluctuation of an 8-sample power average (about ±1.5 dB rms).
    /// </summary>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="station"/> is empty or white space.</exception>
    public Sweep NoiseFloor(DemoPart part, string station)
    {
        CheckStation(part, station);
        var random = new DeterministicRandom(StableHash.Combine(StationKey(part, station), FloorStream));
        var level = new double[part.Grid.Count];
        for (int i = 0; i < level.Length; i++)
        {
            level[i] = 10 * Math.Log10(FloorMw(part, i, ref random));
        }
        return PowerSweep(part, level, station + "_" + part.PartNumber + "_floor.csv", "noise floor");
    }

    /// <summary>One averaged noise-power reading at point <paramref name="index"/>, mW (always above 0).</summary>
    private static double FloorMw(DemoPart part, int index, ref DeterministicRandom random)
    {
        double position = part.Grid.Count > 1 ? (double)index / (part.Grid.Count - 1) : 0.5;
        double meanMw = Math.Pow(10, (AnalyserNoiseFloorDbm + 1.0 * (position - 0.5)) / 10);
        double sum = 0;
        for (int k = 0; k < FloorAveraging; k++)
        {
            sum -= Math.Log(random.NextDoubleNonZero());
        }
        return meanMw * sum / FloorAveraging;
    }

    /// <summary>The station's true thru level per point, dBm: offset and two cable standing-wave ripples.</summary>
    private double[] ThruShapeDbm(DemoPart part, string station)
    {
        var random = new DeterministicRandom(StableHash.Combine(StationKey(part, station), ThruShapeStream));
        // Offset ≤ 0.08 dB (4σ of 0.02), ripples 0.08 and 0.04 dB: never more than ThruRippleDb in all.
        double offsetDb = 0.02 * random.NextTruncatedNormal();
        double cycles1 = 2.5 + 2 * random.NextDouble(), phase1 = random.NextAngle();
        double cycles2 = 7 + 4 * random.NextDouble(), phase2 = random.NextAngle();
        FrequencyGrid grid = part.Grid;
        double span = Math.Max(grid.StopHz - grid.StartHz, 1);
        var level = new double[grid.Count];
        for (int i = 0; i < level.Length; i++)
        {
            double x = (grid[i] - grid.StartHz) / span;
            level[i] = ThruLevelDbm + offsetDb + 0.08 * Math.Sin(2 * Math.PI * cycles1 * x + phase1) + 0.04 * Math.Sin(2 * Math.PI * cycles2 * x + phase2);
        }
        return level;
    }

    private Sweep PowerSweep(DemoPart part, double[] levelDbm, string fileName, string what)
    {
        var source = new SweepSource(fileName, SweepFormat.Synthetic, "", Notes(part, what), []);
        return Sweep.FromScalar(ScalarTrace.Own(part.Grid, ScalarQuantity.PowerDbm, levelDbm, null), source);
    }

    private string[] Notes(DemoPart part, string what) =>
    [
        "Synthetic demo data, not a measurement.",
        string.Create(CultureInfo.InvariantCulture, $"Part {part.PartNumber}, {what}, synthesiser seed {Seed}."),
    ];

    /// <summary>The stream a unit's physical parameters are drawn from (tests use it to recover a unit's model values).</summary>
    internal DeterministicRandom ParameterRandom(DemoPart part, int serialIndex) =>
        new(StableHash.Combine(UnitKey(part, serialIndex), ParameterStream));

    private ulong UnitKey(DemoPart part, int serialIndex) =>
        StableHash.Combine(StableHash.Combine(StableHash.Mix(Seed), StableHash.Of(part.PartNumber)), (ulong)serialIndex);

    private ulong StationKey(DemoPart part, string station) =>
        StableHash.Combine(StableHash.Combine(StableHash.Mix(Seed), StableHash.Of(part.PartNumber)), StableHash.Of("station:" + station));

    private static double MagnitudeSquared(Complex z) => z.Real * z.Real + z.Imaginary * z.Imaginary;

    private static void CheckUnit(DemoPart part, int serialIndex, DefectKind defect)
    {
        ArgumentNullException.ThrowIfNull(part);
        ArgumentOutOfRangeException.ThrowIfLessThan(serialIndex, 1);
        if (defect != DefectKind.None && !part.Defects.Contains(defect))
        {
            throw new ArgumentException(
                $"defect {defect} does not apply to {part.PartNumber}; it can have {string.Join(", ", part.Defects)}", nameof(defect));
        }
    }

    private static void CheckStation(DemoPart part, string station)
    {
        ArgumentNullException.ThrowIfNull(part);
        ArgumentNullException.ThrowIfNull(station);
        if (string.IsNullOrWhiteSpace(station))
        {
            throw new ArgumentException("station name must not be empty", nameof(station));
        }
    }
}
