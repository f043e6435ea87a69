using System.Globalization;
using System.Numerics;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Synthesis;

/// <summary>
/// A bandpass demo part: Chebyshev (or Butterworth) prototype transformed to bandpass, finite resonator Q,
/// a flat loss, a coherent feedthrough floor, optional triple-transit echo and spurious response, and
/// reflections consistent with power balance. Spreads are standard deviations of Gaussians truncated at
/// ±4σ (see <see cref="DeterministicRandom.NextTruncatedNormal"/>).
/// </summary>
internal sealed class BandpassDesign : PartDesign
{
    private readonly Complex[] _poles;
    private readonly Complex _numerator;
    private DefectKind[]? _defects;

    public BandpassDesign(int order, double rippleDb)
    {
        Order = order;
        RippleDb = rippleDb;
        _poles = BandpassPrototype.Poles(order, rippleDb);
        _numerator = BandpassPrototype.DcGainNumerator(_poles);
    }

    public int Order { get; }

    /// <summary>Prototype ripple, dB; 0 for Butterworth.</summary>
    public double RippleDb { get; }

    /// <summary>
    /// True for a transversal SAW filter: the prototype sets only the magnitude and the phase is a pure delay
    /// (a symmetric impulse response), so group delay is flat apart from echo and feedthrough ripple.
    /// False: the prototype's own minimum phase plus <see cref="DelayS"/>.
    /// </summary>
    public bool LinearPhase { get; init; }

    /// <summary>Arithmetic centre of the prototype band edges, Hz, and its spread.</summary>
    public required double CentreHz { get; init; }
    public required double CentreSigmaHz { get; init; }

    /// <summary>Prototype bandwidth (ripple band; 3 dB band for Butterworth), Hz, and its relative spread.</summary>
    public required double BandwidthHz { get; init; }
    public required double BandwidthSigmaRelative { get; init; }

    /// <summary>Minimum insertion loss of the filter response (before feedthrough and noise), dB, and its spread.</summary>
    public required double InsertionLossDb { get; init; }
    public required double InsertionLossSigmaDb { get; init; }

    /// <summary>Unloaded Q of the resonators (rounds the passband corners); 0 for none.</summary>
    public double UnloadedQ { get; init; }

    /// <summary>Delay added to the phase, s (acoustic path of a SAW, package).</summary>
    public double DelayS { get; init; }

    /// <summary>Triple-transit echo level below the main signal, dB (positive), and spread; 0 for no echo. Arrives 2·<see cref="DelayS"/> later.</summary>
    public double EchoRejectionDb { get; init; }
    public double EchoSigmaDb { get; init; }

    /// <summary>Feedthrough floor below the passband, dB (positive), and spread. Capacitive: rises with f.</summary>
    public required double FeedthroughRejectionDb { get; init; }
    public required double FeedthroughSigmaDb { get; init; }

    /// <summary>Mid-band return loss of each port, dB, and spread.</summary>
    public required double ReturnLossDb { get; init; }
    public required double ReturnLossSigmaDb { get; init; }

    /// <summary>Share of the power not transmitted that is reflected (not dissipated) far out of band, 0..1.</summary>
    public required double StopbandReflectedShare { get; init; }

    /// <summary>Electrical length of each port's lead, s (rotates the reflection phase).</summary>
    public double PortDelayS { get; init; }

    /// <summary>Optional spurious response.</summary>
    public SpuriousDesign? Spurious { get; init; }

    /// <summary><see cref="DefectKind.CentreDrift"/>: shift of the centre, Hz (sign drawn per unit); 0 when the part has no centre limit.</summary>
    public double DriftHz { get; init; }

    /// <summary><see cref="DefectKind.HighLoss"/>: insertion loss, dB (same spread as good units).</summary>
    public required double DefectInsertionLossDb { get; init; }

    /// <summary><see cref="DefectKind.LowRejection"/>: feedthrough floor below the passband, dB (same spread).</summary>
    public required double DefectFeedthroughRejectionDb { get; init; }

    public override IReadOnlyList<DefectKind> Defects => _defects ??= BuildDefects();

    private DefectKind[] BuildDefects()
    {
        var list = new List<DefectKind>();
        if (DriftHz > 0)
        {
            list.Add(DefectKind.CentreDrift);
        }
        list.Add(DefectKind.LowRejection);
        if (Spurious is not null)
        {
            list.Add(DefectKind.StrongUnwantedMode);
        }
        list.Add(DefectKind.HighLoss);
        return [.. list];
    }

    public override void Synthesise(FrequencyGrid grid, ref DeterministicRandom parameters, DefectKind defect,
        Span<Complex> s11, Span<Complex> s21, Span<Complex> s22)
    {
        // Fixed draw order (see PartDesign): never skip a draw because of the defect.
        double centreZ = parameters.NextTruncatedNormal();
        double bandwidthZ = parameters.NextTruncatedNormal();
        double lossZ = parameters.NextTruncatedNormal();
        double feedthroughZ = parameters.NextTruncatedNormal();
        double feedthroughPhase = parameters.NextAngle();
        double returnLoss1Z = parameters.NextTruncatedNormal();
        double returnLoss2Z = parameters.NextTruncatedNormal();
        double reflectionPhase1 = parameters.NextAngle();
        double reflectionPhase2 = parameters.NextAngle();
        double echoZ = parameters.NextTruncatedNormal();
        double echoPhase = parameters.NextAngle();
        double spuriousZ = parameters.NextTruncatedNormal();
        double spuriousPhase = parameters.NextAngle();
        double driftSign = parameters.NextDouble() < 0.5 ? -1.0 : 1.0;

        double centreHz = CentreHz + CentreSigmaHz * centreZ + (defect == DefectKind.CentreDrift ? driftSign * DriftHz : 0);
        double bandwidthHz = BandwidthHz * (1 + BandwidthSigmaRelative * bandwidthZ);
        double lossDb = (defect == DefectKind.HighLoss ? DefectInsertionLossDb : InsertionLossDb) + InsertionLossSigmaDb * lossZ;
        double feedthroughDb = (defect == DefectKind.LowRejection ? DefectFeedthroughRejectionDb : FeedthroughRejectionDb)
            + FeedthroughSigmaDb * feedthroughZ;

        double f0 = BandpassPrototype.GeometricCentreHz(centreHz, bandwidthHz);
        double dissipation = UnloadedQ > 0 ? f0 / (bandwidthHz * UnloadedQ) : 0;
        ReadOnlySpan<double> hz = grid.Hz;
        ReadOnlySpan<Complex> poles = _poles;

        // Pass 1: the prototype response, and its peak power for the loss normalisation.
        double peakPower = 0;
        for (int i = 0; i < hz.Length; i++)
        {
            Complex h = BandpassPrototype.Evaluate(poles, _numerator, hz[i], f0, bandwidthHz, dissipation);
            s21[i] = h;
            peakPower = Math.Max(peakPower, h.Real * h.Real + h.Imaginary * h.Imaginary);
        }

        double passband = Math.Pow(10, -lossDb / 20);
        double scale = passband / Math.Sqrt(peakPower);
        double feedthrough = passband * Math.Pow(10, -feedthroughDb / 20);
        double echo = EchoRejectionDb > 0 ? Math.Pow(10, -(EchoRejectionDb + EchoSigmaDb * echoZ) / 20) : 0;
        double spurious = 0, spuriousHz = 0, spuriousHalfWidthHz = 1;
        if (Spurious is { } spur)
        {
            double rejection = (defect == DefectKind.StrongUnwantedMode ? spur.DefectRejectionDb : spur.RejectionDb) + spur.RejectionSigmaDb * spuriousZ;
            spurious = passband * Math.Pow(10, -rejection / 20);
            spuriousHz = centreHz + spur.OffsetHz;
            spuriousHalfWidthHz = spur.WidthHz / 2;
        }
        double transmittedShare = passband * passband;
        double inBandShare1 = InBandReflectedShare(ReturnLossDb + ReturnLossSigmaDb * returnLoss1Z, transmittedShare);
        double inBandShare2 = InBandReflectedShare(ReturnLossDb + ReturnLossSigmaDb * returnLoss2Z, transmittedShare);
        Complex feedthroughPhasor = Complex.FromPolarCoordinates(feedthrough, feedthroughPhase);
        Complex spuriousPhasor = Complex.FromPolarCoordinates(spurious, spuriousPhase);

        // Pass 2: scale, phase, additive paths, reflections.
        for (int i = 0; i < hz.Length; i++)
        {
            double f = hz[i];
            Complex h = s21[i];
            double relativePower = (h.Real * h.Real + h.Imaginary * h.Imaginary) / peakPower;
            Complex delay = UnitPhasor(-2 * Math.PI * Fraction(f * DelayS));
            Complex t = LinearPhase ? h.Magnitude * scale * delay : h * scale * delay;
            if (echo > 0)
            {
                t *= Complex.One + echo * UnitPhasor(-2 * Math.PI * Fraction(2 * f * DelayS) + echoPhase);
            }
            t += feedthroughPhasor * (f / centreHz);
            if (spurious > 0)
            {
                t += spuriousPhasor / new Complex(1, (f - spuriousHz) / spuriousHalfWidthHz);
            }
            s21[i] = t;

            // Power not transmitted is reflected or dissipated. In band most of it is dissipated (a lossy part
            // matched to its terminations); out of band most is reflected. The weight falls from 1 in the
            // passband to 0 a few dB outside it; using 1/p − 1 (linear in attenuation power) keeps it cheap.
            double excess = (1 / relativePower - 1) / 1.5;
            double weight = Math.Exp(-excess * excess);
            double notTransmitted = 1 - (t.Real * t.Real + t.Imaginary * t.Imaginary);
            double share1 = StopbandReflectedShare - (StopbandReflectedShare - inBandShare1) * weight;
            double share2 = StopbandReflectedShare - (StopbandReflectedShare - inBandShare2) * weight;
            double rotation = 2 * Math.Atan(2 * (f - centreHz) / bandwidthHz);
            double lead = -4 * Math.PI * Fraction(f * PortDelayS);
            s11[i] = Complex.FromPolarCoordinates(Math.Sqrt(notTransmitted * share1), reflectionPhase1 + lead - rotation);
            s22[i] = Complex.FromPolarCoordinates(Math.Sqrt(notTransmitted * share2), reflectionPhase2 + lead + rotation);
        }
    }

    /// <summary>Share of the non-transmitted power reflected at mid-band so the port shows <paramref name="returnLossDb"/>.</summary>
    private static double InBandReflectedShare(double returnLossDb, double transmittedShare)
    {
        double share = Math.Pow(10, -returnLossDb / 10) / (1 - transmittedShare);
        if (!(share <= 1))
        {
            // Only a design error can get here: a passive part cannot reflect more than it does not transmit.
            throw new InvalidOperationException(string.Create(CultureInfo.InvariantCulture,
                $"return loss {returnLossDb} dB is impossible with {transmittedShare} of the power transmitted"));
        }
        return share;
    }

    internal static Complex UnitPhasor(double radians)
    {
        (double sin, double cos) = Math.SinCos(radians);
        return new Complex(cos, sin);
    }

    /// <summary>x − floor(x): keeps phases of long delays small before the sine, for accuracy.</summary>
    internal static double Fraction(double x) => x - Math.Floor(x);
}
