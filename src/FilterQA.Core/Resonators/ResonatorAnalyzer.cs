using System.Globalization;
using System.Numerics;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Resonators;

/// <summary>
/// Measures a quartz crystal, ceramic resonator or LC resonance from one sweep: peak and notch as sampled
/// (parabola-refined), and the Butterworth–Van Dyke model of the main mode by least squares.
/// </summary>
/// <remarks>
/// <para>Method. Every fixture is reduced to the resonance response g = Rext/(Z + Rext) (see <see cref="ResonatorFixture"/>).
/// Starting values come from the data (DOMAIN 3): fs from the |g| peak, R1 = Rext·(1/|g|peak − 1), QL from the
/// half-power width, Qu = QL/(1 − |g|peak), L1 = Qu·R1/(2π·fs), C1 = 1/((2π·fs)²·L1), and C0 = C1/((fp/fs)² − 1)
/// from the antiresonance notch when the span holds one. A Levenberg–Marquardt fit of the complex g over the whole
/// span then refines fs, R1, Q and C0. Unwanted modes are not cut out of the data: each of the strongest
/// (<see cref="ResonatorOptions.MaxModeArms"/>) is modelled as a motional arm of its own, so its skirt cannot pull
/// the main arm or C0.</para>
/// <para>Magnitude-only input (a scalar trace, or a trace without phase): for the series fixture |S21| is fitted
/// with the same model (|g| = |S21|); for the one-port and shunt fixtures g needs the phase, so only the peak,
/// notch and mode fields are reported, with <see cref="ResonatorWarningCode.MagnitudeOnlyNotFitted"/>.</para>
/// <para>C0 and fp are reported only when the span holds an antiresonance: an interior minimum of |g| above the
/// main peak with at least <see cref="ResonatorOptions.ModeProminenceDb"/> of rise after it. C0 is still fitted
/// otherwise (a free, possibly zero, parameter) so that an unseen C0 does not bias R1 and Q, but it is not reported.</para>
/// </remarks>
public static class ResonatorAnalyzer
{
    /// <summary>
    /// A mode must rise this many times the estimated RMS noise above its base (in linear magnitude), so that noise
    /// at the bottom of a deep notch, where a few dB are a tiny absolute change, is never reported as a mode.
    /// </summary>
    private const double ModeNoiseFactor = 10;

    /// <summary>Measures with the fixture implied by the sweep: one-port reflection for a one-port, series-through otherwise.</summary>
    /// <exception cref="ArgumentNullException"><paramref name="sweep"/> is null.</exception>
    /// <exception cref="ArgumentException">See <see cref="Measure(Sweep, ResonatorFixture, ResonatorOptions?)"/>.</exception>
    public static ResonatorMeasurement Measure(Sweep sweep, ResonatorOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        ResonatorFixture fixture = sweep.Network is { PortCount: 1 } ? ResonatorFixture.OnePortReflection : ResonatorFixture.SeriesThrough;
        return Measure(sweep, fixture, options);
    }

    /// <summary>
    /// Measures a sweep: S21 of a network with two or more ports (Z0 from its port reference impedances), S11 of a
    /// one-port, or a scalar gain trace (magnitude only; Z0 = <see cref="ResonatorOptions.ScalarReferenceOhm"/>).
    /// </summary>
    /// <exception cref="ArgumentNullException"><paramref name="sweep"/> is null.</exception>
    /// <exception cref="ArgumentException">
    /// The fixture does not suit the data (one-port data for a two-port fixture or the reverse), ports 1 and 2 have
    /// different reference impedances, or a scalar trace is a power in dBm not yet normalised by a thru.
    /// </exception>
    public static ResonatorMeasurement Measure(Sweep sweep, ResonatorFixture fixture, ResonatorOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(sweep);
        options ??= ResonatorOptions.Default;
        if (sweep.Network is { } network)
        {
            CheckPorts(network.PortCount == 1, fixture);
            double z0 = network.ReferenceOhm[0];
            if (network.PortCount > 1)
            {
                double z02 = network.ReferenceOhm[1];
                if (Math.Abs(z02 - z0) > 1e-9 * z0)
                {
                    throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                        $"resonator formulas need one reference impedance at ports 1 and 2; got {z0} ohm and {z02} ohm"), nameof(sweep));
                }
            }
            ReadOnlySpan<Complex> s = network.PortCount == 1 ? network.Trace(1, 1) : network.Trace(2, 1);
            return Analyse(network.Grid.Hz, s.ToArray(), z0, fixture, options);
        }
        ScalarTrace scalar = sweep.Scalar!;
        if (scalar.Quantity == ScalarQuantity.PowerDbm)
        {
            throw new ArgumentException("the scalar trace is a power in dBm; normalise it by a thru to a gain before measuring a resonator", nameof(sweep));
        }
        return Measure(ResponseTrace.Primary(sweep), options.ScalarReferenceOhm, fixture, options);
    }

    /// <summary>
    /// Measures one response trace: a transmission trace for the series and shunt fixtures, a reflection trace for the
    /// one-port. With phase the trace is used as complex data; without it, see the remarks on magnitude-only input.
    /// </summary>
    /// <param name="trace">The response; loss in dB (positive = attenuation), optional phase in radians.</param>
    /// <param name="referenceOhm">Port impedance Z0, ohm; finite, &gt; 0.</param>
    /// <param name="fixture">How the part was connected.</param>
    /// <param name="options">Settings; null for <see cref="ResonatorOptions.Default"/>.</param>
    /// <exception cref="ArgumentException">A reflection trace for a two-port fixture or a transmission trace for the one-port.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="referenceOhm"/> not finite and positive.</exception>
    public static ResonatorMeasurement Measure(ResponseTrace trace, double referenceOhm, ResonatorFixture fixture, ResonatorOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(trace);
        if (!double.IsFinite(referenceOhm) || referenceOhm <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(referenceOhm), referenceOhm, "Z0 must be finite and > 0 ohm");
        }
        options ??= ResonatorOptions.Default;
        CheckPorts(trace.Path != ResponsePath.Transmission, fixture);
        ReadOnlySpan<double> loss = trace.LossDb;
        if (trace.HasPhase)
        {
            ReadOnlySpan<double> phase = trace.PhaseRad;
            var s = new Complex[loss.Length];
            for (int i = 0; i < s.Length; i++)
            {
                s[i] = Complex.FromPolarCoordinates(Math.Pow(10, -loss[i] / 20), phase[i]);
            }
            return Analyse(trace.Grid.Hz, s, referenceOhm, fixture, options);
        }
        return Analyse(trace.Grid.Hz, null, loss.ToArray(), referenceOhm, fixture, options);
    }

    private static void CheckPorts(bool reflectionData, ResonatorFixture fixture)
    {
        if (reflectionData != (fixture == ResonatorFixture.OnePortReflection))
        {
            throw new ArgumentException(reflectionData
                ? $"one-port (reflection) data cannot be measured as {fixture}; use {nameof(ResonatorFixture.OnePortReflection)}"
                : $"transmission data cannot be measured as {nameof(ResonatorFixture.OnePortReflection)}; use {nameof(ResonatorFixture.SeriesThrough)} or {nameof(ResonatorFixture.ShuntToGround)}");
        }
    }

    private static ResonatorMeasurement Analyse(ReadOnlySpan<double> hz, Complex[] s, double z0, ResonatorFixture fixture, ResonatorOptions options)
    {
        var loss = new double[s.Length];
        for (int i = 0; i < s.Length; i++)
        {
            double magnitude = s[i].Magnitude;
            loss[i] = magnitude > 0 ? Math.Min(-20 * Math.Log10(magnitude), ResponseTrace.ZeroMagnitudeLossDb) : ResponseTrace.ZeroMagnitudeLossDb;
        }
        return Analyse(hz, s, loss, z0, fixture, options);
    }

    private static ResonatorMeasurement Analyse(ReadOnlySpan<double> hz, Complex[]? s, double[] lossDb, double z0, ResonatorFixture fixture, ResonatorOptions options)
    {
        var warnings = new List<ResonatorWarning>();
        int n = hz.Length;
        var level = new double[n];
        for (int i = 0; i < n; i++)
        {
            level[i] = -lossDb[i];
        }

        // Sampled features of the measured S-parameter itself.
        double? peakHz = null, peakLossDb = null, notchHz = null, notchLossDb = null;
        bool dipFixture = fixture != ResonatorFixture.SeriesThrough;
        if (fixture != ResonatorFixture.OnePortReflection)
        {
            int peak = Extrema.ArgMax(level);
            (double f, double v) = Extrema.Vertex(hz, level, peak);
            (peakHz, peakLossDb) = (f, -v);
        }
        int notch = NotchIndex(lossDb, fixture, options);
        if (notch >= 0)
        {
            (double f, double v) = Extrema.Vertex(hz, lossDb, notch);
            (notchHz, notchLossDb) = (f, v);
        }
        // The main response as reported: the deepest dip (one-port, shunt) or the highest peak (series).
        int mainIndex = dipFixture ? Extrema.ArgMax(lossDb) : Extrema.ArgMax(level);
        double[] reportLevel = dipFixture ? lossDb : level;

        // The resonance response g = Rext/(Z + Rext); without phase only the series fixture has it (|g| = |S21|).
        double rext = fixture switch
        {
            ResonatorFixture.SeriesThrough => 2 * z0,
            ResonatorFixture.OnePortReflection => z0,
            _ => z0 / 2,
        };
        Complex[]? g = null;
        double[]? gMagnitude = null;
        if (s is not null)
        {
            g = new Complex[n];
            gMagnitude = new double[n];
            for (int i = 0; i < n; i++)
            {
                g[i] = fixture switch
                {
                    ResonatorFixture.SeriesThrough => s[i],
                    ResonatorFixture.OnePortReflection => (1 - s[i]) / 2,
                    _ => 1 - s[i],
                };
                gMagnitude[i] = g[i].Magnitude;
            }
        }
        else if (fixture == ResonatorFixture.SeriesThrough)
        {
            gMagnitude = Linear(lossDb);
        }

        UnwantedMode[] modes;
        if (gMagnitude is null)
        {
            // A dip fixture without phase: modes are the prominent dips of |S| itself.
            double noise = NoiseEstimate.RealRms(Linear(lossDb));
            modes = ReportedModes(hz, reportLevel, mainIndex, ProminentModes(reportLevel, mainIndex, noise, dip: true, options));
            warnings.Add(new(ResonatorWarningCode.MagnitudeOnlyNotFitted,
                Text($"the {fixture} fixture needs the phase to separate R1, L1, C1 and C0; without it only the peak, notch and modes are reported")));
            return new(peakHz, peakLossDb, notchHz, notchLossDb, null, null, null, null, null, null, null, null, modes, [.. warnings]);
        }

        var gDb = new double[n];
        for (int i = 0; i < n; i++)
        {
            gDb[i] = gMagnitude[i] > 0 ? Math.Max(20 * Math.Log10(gMagnitude[i]), -ResponseTrace.ZeroMagnitudeLossDb) : -ResponseTrace.ZeroMagnitudeLossDb;
        }
        double gNoise = g is not null ? NoiseEstimate.ComplexRms(g) : NoiseEstimate.RealRms(gMagnitude);
        // Modes are found as peaks of |g| in every fixture: for a one-port |S11| dips of a few dB can be strong modes
        // (|S11| is not monotonic in R), while |g| = Z0/|Z + Z0| behaves like a transmission peak. They are then
        // reported at the matching extremum of the measured |S|.
        int mainG = Climb(gDb, mainIndex);
        List<int> gModes = ProminentModes(gDb, mainG, gNoise, dip: false, options);
        var reportIndices = gModes.Select(p => dipFixture ? Climb(lossDb, p) : p).Where(p => p != mainIndex).Distinct().ToList();
        modes = ReportedModes(hz, reportLevel, mainIndex, reportIndices);

        FitOutcome? fit = n < 5 ? null : FitMain(hz, g, gMagnitude, gDb, mainG, gModes, gNoise, rext, options, warnings);
        if (n < 5)
        {
            warnings.Add(new(ResonatorWarningCode.TooFewPoints, Text($"the sweep has {n} points; at least 5 are needed to fit a resonance")));
        }
        return fit is null
            ? new(peakHz, peakLossDb, notchHz, notchLossDb, null, null, null, null, null, null, null, null, modes, [.. warnings])
            : new(peakHz, peakLossDb, notchHz, notchLossDb, fit.SeriesHz, fit.ParallelHz, fit.R1Ohm, fit.C1F, fit.L1H, fit.C0F,
                fit.UnloadedQ, fit.LoadedQ, modes, [.. warnings]);
    }

    /// <summary>From <paramref name="index"/>, walks uphill in <paramref name="y"/> to the local maximum.</summary>
    private static int Climb(double[] y, int index)
    {
        while (true)
        {
            if (index > 0 && y[index - 1] > y[index] && (index == y.Length - 1 || y[index - 1] >= y[index + 1]))
            {
                index--;
            }
            else if (index < y.Length - 1 && y[index + 1] > y[index])
            {
                index++;
            }
            else
            {
                return index;
            }
        }
    }

    /// <summary>Indices of prominent maxima of <paramref name="levelDb"/> that stand above the noise, other than <paramref name="main"/>.</summary>
    private static List<int> ProminentModes(double[] levelDb, int main, double noise, bool dip, ResonatorOptions options) =>
        Extrema.ProminentPeaks(levelDb, options.ModeProminenceDb)
            .Where(p => p.Index != main && StandsAboveNoise(levelDb[p.Index], p.BaseDb, noise, dip))
            .Select(p => p.Index)
            .ToList();

    private sealed record FitOutcome(double SeriesHz, double? ParallelHz, double R1Ohm, double C1F, double L1H, double? C0F, double UnloadedQ, double LoadedQ);

    private static FitOutcome? FitMain(ReadOnlySpan<double> hz, Complex[]? g, double[] gMagnitude, double[] gDb, int main, List<int> modeIndices,
        double gNoise, double rext, ResonatorOptions options, List<ResonatorWarning> warnings)
    {
        int n = hz.Length;
        if (main == 0 || main == n - 1)
        {
            warnings.Add(new(ResonatorWarningCode.ResonanceAtSpanEdge,
                Text($"the strongest response is at the {(main == 0 ? "first" : "last")} point ({hz[main]:F1} Hz); the resonance may lie outside the span {hz[0]:F1}..{hz[n - 1]:F1} Hz, so nothing was fitted")));
            return null;
        }
        ArmGuess? mainGuess = GuessArm(hz, gDb, main, rext, fallbackQ: null);
        if (mainGuess is not { } guess)
        {
            warnings.Add(new(ResonatorWarningCode.BandwidthNotInSpan,
                Text($"neither half-power point of the response at {hz[main]:F1} Hz lies inside the span {hz[0]:F1}..{hz[n - 1]:F1} Hz; widen the span to fit the resonance")));
            return null;
        }

        // Antiresonance: the deepest point of |g| above the main peak, if |g| rises again after it.
        int anti = main + 1 + Extrema.ArgMax(Negated(gDb.AsSpan(main + 1)));
        bool hasAnti = false;
        double c0Start = 0;
        double c1Start = 1 / (Math.Pow(2 * Math.PI * guess.FsHz, 2) * (guess.Q * guess.ROhm / (2 * Math.PI * guess.FsHz)));
        if (anti < n - 1)
        {
            double riseAfter = gDb.AsSpan(anti).ToArray().Max() - gDb[anti];
            (double fpHz, _) = Extrema.Vertex(hz, gDb, anti);
            if (riseAfter >= options.ModeProminenceDb && fpHz > guess.FsHz)
            {
                hasAnti = true;
                c0Start = c1Start / ((fpHz / guess.FsHz) * (fpHz / guess.FsHz) - 1);
            }
        }
        // Without an antiresonance C0 is unknown; its unit is then a C0 100 times C1 (a typical crystal ratio r).
        double c0Scale = hasAnti ? c0Start : 100 * c1Start;

        // Unwanted modes of g, modelled as arms of their own (the strongest first).
        List<int> candidates = [.. modeIndices.OrderByDescending(i => gDb[i])];
        var arms = new List<ArmGuess> { guess };
        foreach (int candidate in candidates.Take(options.MaxModeArms))
        {
            if (GuessArm(hz, gDb, candidate, rext, fallbackQ: guess.Q) is { } spur)
            {
                arms.Add(spur);
            }
        }
        if (candidates.Count > options.MaxModeArms)
        {
            warnings.Add(new(ResonatorWarningCode.ModesNotModelled,
                Text($"{candidates.Count} unwanted modes found, {options.MaxModeArms} modelled as arms; the {candidates.Count - options.MaxModeArms} weakest are left out of the fit and may bias it")));
        }

        double[]? magnitudeOnly = g is null ? gMagnitude : null;
        BvdFitResult fit = BvdFitter.Fit(hz, g, magnitudeOnly, rext, c0Start, c0Scale, [.. arms], options.MaxIterations);

        double fs = fit.FsHz[0], r1 = fit.ROhm[0], qu = fit.Q[0];
        double ws = 2 * Math.PI * fs;
        double l1 = qu * r1 / ws;
        double c1 = 1 / (ws * ws * l1);
        double ql = ws * l1 / (r1 + rext);
        double? c0 = null, fp = null;
        if (hasAnti && fit.C0F > 0)
        {
            double fpFit = fs * Math.Sqrt(1 + c1 / fit.C0F);
            if (fpFit <= hz[n - 1])
            {
                (c0, fp) = (fit.C0F, fpFit);
            }
        }
        if (fp is null)
        {
            warnings.Add(new(ResonatorWarningCode.NoAntiresonance, hasAnti
                ? Text($"a notch was seen near {hz[anti]:F1} Hz but the fit places no antiresonance inside the span (fitted C0 {fit.C0F:E3} F); C0 and fp are not reported")
                : Text($"|S| has no antiresonance notch between the resonance at {fs:F1} Hz and the end of the span at {hz[n - 1]:F1} Hz (a series LC has none); C0 and fp are not reported")));
        }

        if (!fit.Converged)
        {
            warnings.Add(new(ResonatorWarningCode.FitNotConverged,
                Text($"the least-squares fit stopped after {fit.Iterations} iterations without converging; fitted values are the last iterate")));
        }
        double peakFit = rext / (r1 + rext);
        if (fit.RmsResidual > options.MaxResidualFraction * peakFit && fit.RmsResidual > 3 * gNoise)
        {
            warnings.Add(new(ResonatorWarningCode.FitPoorResidual,
                Text($"RMS fit residual {fit.RmsResidual:E3} is {100 * fit.RmsResidual / peakFit:F2} % of the peak response {peakFit:F4} (limit {100 * options.MaxResidualFraction:F2} %) and {fit.RmsResidual / Math.Max(gNoise, double.Epsilon):F1} times the noise {gNoise:E3}; the part does not follow the BVD model here (fixture delay, uncorrected thru, unmodelled mode)")));
        }
        CheckSampling(hz, fs, fs / ql, options, warnings);
        return new FitOutcome(fs, fp, r1, c1, l1, c0, qu, ql);
    }

    /// <summary>Starting values of an arm from the peak of |g| at <paramref name="index"/>; null when no half-power point is in the span.</summary>
    private static ArmGuess? GuessArm(ReadOnlySpan<double> hz, double[] gDb, int index, double rext, double? fallbackQ)
    {
        (double fsHz, double peakDb) = Extrema.Vertex(hz, gDb, index);
        double target = peakDb - 10 * Math.Log10(2);
        double? low = Extrema.Crossing(hz, gDb, index, -1, target, peakDb);
        double? high = Extrema.Crossing(hz, gDb, index, +1, target, peakDb);
        double bandwidth;
        if (low is { } l && high is { } h)
        {
            bandwidth = h - l;
        }
        else if (low is { } l1)
        {
            bandwidth = 2 * (fsHz - l1);
        }
        else if (high is { } h1)
        {
            bandwidth = 2 * (h1 - fsHz);
        }
        else if (fallbackQ is { } q)
        {
            bandwidth = fsHz / q;
        }
        else
        {
            return null;
        }
        bandwidth = Math.Max(bandwidth, 1e-9 * fsHz);
        // A sampled |g| at or above 1 (noise, or a thru normalised slightly high) would make R1 negative; start small instead.
        double peak = Math.Min(Math.Pow(10, peakDb / 20), 0.999);
        double r = rext * (1 / peak - 1);
        double loadedQ = fsHz / bandwidth;
        double unloadedQ = loadedQ / (1 - peak);
        return new ArmGuess(fsHz, bandwidth, r, unloadedQ);
    }

    /// <summary>Raises the sampling-adequacy warnings for a resonance of loaded width <paramref name="bandwidthHz"/> at <paramref name="fsHz"/>.</summary>
    private static void CheckSampling(ReadOnlySpan<double> hz, double fsHz, double bandwidthHz, ResonatorOptions options, List<ResonatorWarning> warnings)
    {
        double low = fsHz - bandwidthHz / 2, high = fsHz + bandwidthHz / 2;
        int inside = 0;
        double step = 0;
        for (int i = 0; i < hz.Length; i++)
        {
            if (hz[i] >= low && hz[i] <= high)
            {
                inside++;
            }
            // The steps that touch fs ± B/2, including the ones that straddle its edges.
            if (i > 0 && hz[i] >= low && hz[i - 1] <= high)
            {
                step = Math.Max(step, hz[i] - hz[i - 1]);
            }
        }
        if (inside < options.MinPointsInBandwidth)
        {
            warnings.Add(new(ResonatorWarningCode.TooFewPointsInBandwidth,
                Text($"{inside} points lie within fs ± B/2 = {low:F1}..{high:F1} Hz (B = fs/QL = {bandwidthHz:F1} Hz); at least {options.MinPointsInBandwidth} are wanted (common practice)")));
        }
        if (step > options.MaxStepFractionOfBandwidth * bandwidthHz)
        {
            double ratio = step / bandwidthHz;
            warnings.Add(new(ResonatorWarningCode.StepTooCoarse,
                Text($"the step near fs is {step:F1} Hz = {ratio:F3}·B (B = {bandwidthHz:F1} Hz, limit {options.MaxStepFractionOfBandwidth:F3}·B); a sampled peak can read up to {10 * Math.Log10(1 + ratio * ratio):F3} dB low")));
        }
    }

    /// <summary>
    /// Index of the reported notch: the largest loss. For the series fixture it must be inside the span (a falling
    /// skirt at the edge is no notch), else the deepest interior loss maximum of enough prominence; −1 when none.
    /// </summary>
    private static int NotchIndex(double[] lossDb, ResonatorFixture fixture, ResonatorOptions options)
    {
        int deepest = Extrema.ArgMax(lossDb);
        if (fixture != ResonatorFixture.SeriesThrough || (deepest > 0 && deepest < lossDb.Length - 1))
        {
            return deepest;
        }
        List<Extrema.Peak> interior = Extrema.ProminentPeaks(lossDb, options.ModeProminenceDb);
        return interior.Count == 0 ? -1 : interior.MaxBy(p => lossDb[p.Index]).Index;
    }

    /// <summary>
    /// Unwanted modes as reported, at <paramref name="indices"/> of <paramref name="levelDb"/> (20·log10|S| for peaks, the
    /// loss for dips), parabola-refined, relative to the main response at <paramref name="main"/>, in frequency order.
    /// </summary>
    private static UnwantedMode[] ReportedModes(ReadOnlySpan<double> hz, double[] levelDb, int main, List<int> indices)
    {
        (_, double mainLevel) = Extrema.Vertex(hz, levelDb, main);
        var modes = new List<UnwantedMode>();
        foreach (int index in indices.Order())
        {
            (double f, double v) = Extrema.Vertex(hz, levelDb, index);
            // Peaks (levelDb = 20·log10|S|): mode level − main level. Dips (levelDb is the loss −20·log10|S|):
            // main |S| dB − mode |S| dB = mode loss − main loss. Both are v − mainLevel; negative when the mode is weaker.
            modes.Add(new UnwantedMode(f, v - mainLevel));
        }
        return [.. modes];
    }

    /// <summary>True when the extremum differs from its base by at least <see cref="ModeNoiseFactor"/>·noise in linear magnitude.</summary>
    private static bool StandsAboveNoise(double levelDb, double baseDb, double noise, bool dip)
    {
        double sign = dip ? -1 : 1;
        double height = Math.Abs(Math.Pow(10, sign * levelDb / 20) - Math.Pow(10, sign * baseDb / 20));
        return height >= ModeNoiseFactor * noise;
    }

    private static double[] Linear(double[] lossDb)
    {
        var magnitude = new double[lossDb.Length];
        for (int i = 0; i < magnitude.Length; i++)
        {
            magnitude[i] = Math.Pow(10, -lossDb[i] / 20);
        }
        return magnitude;
    }

    private static double[] Negated(ReadOnlySpan<double> values)
    {
        var negated = new double[values.Length];
        for (int i = 0; i < negated.Length; i++)
        {
            negated[i] = -values[i];
        }
        return negated;
    }

    private static string Text(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
