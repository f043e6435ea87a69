using System.Numerics;

namespace FilterQA.Core.Resonators;

/// <summary>
/// Levenberg–Marquardt fit of a Butterworth–Van Dyke model (C0 across one or more motional R–L–C arms) to the
/// resonance response g = Rext·Y/(1 + Rext·Y) = Rext/(Z + Rext), Y = jωC0 + Σ 1/(R + jωL + 1/(jωC)).
/// </summary>
/// <remarks>
/// Every fixture reduces to g: series S21 = g (Rext = 2Z0); one-port (1 − S11)/2 = g (Rext = Z0); shunt 1 − S21 = g
/// (Rext = Z0/2). The residual is complex g − g_meas (or |g| − |g_meas| without phase), which is the measured
/// S-parameter residual up to a constant factor, so plain least squares is the maximum-likelihood fit for white
/// noise on S. g is bounded and is computed from Y, so the antiresonance (Z → ∞) is harmless.
/// Parameters are scaled for conditioning at Q ~ 1e5: each arm's fs is fitted as fs0 + B·x (x in loaded
/// bandwidths, so a ppm shift is a change of order 1, not 1e-6 of the value), R and Q as logarithms, and C0
/// linearly in units of its starting estimate. With arm reactance written as X = R·Q·(ω − ωs)(ω + ωs)/(ω·ωs)
/// the detuning is formed as a difference of nearby frequencies, not of their squares' ratio. The Jacobian is
/// analytic. Own solver rather than MathNet's general minimiser: the normal equations are accumulated point by
/// point without storing the Jacobian, which keeps a 2 001-point fit well inside its time budget.
/// </remarks>
internal sealed class BvdFitter
{
    private const double StepTolerance = 1e-9;

    private readonly double[] _omega;
    private readonly Complex[]? _g;
    private readonly double[]? _magnitude;
    private readonly double _rext;
    private readonly double _c0Scale;
    private readonly ArmGuess[] _arms;

    private BvdFitter(double[] omega, Complex[]? g, double[]? magnitude, double rext, double c0Scale, ArmGuess[] arms)
    {
        _omega = omega;
        _g = g;
        _magnitude = magnitude;
        _rext = rext;
        _c0Scale = c0Scale;
        _arms = arms;
    }

    /// <summary>
    /// Fits the model. Exactly one of <paramref name="g"/> (complex) and <paramref name="magnitude"/> (|g|) is given.
    /// </summary>
    /// <param name="hz">Frequencies, Hz (positive).</param>
    /// <param name="g">Measured complex g, or null.</param>
    /// <param name="magnitude">Measured |g|, or null.</param>
    /// <param name="rextOhm">External resistance of the fixture, ohm.</param>
    /// <param name="c0StartF">Starting C0, F (0 when unknown).</param>
    /// <param name="c0ScaleF">Unit of the C0 parameter, F (positive).</param>
    /// <param name="arms">Starting values, main arm first.</param>
    /// <param name="maxIterations">Iteration limit.</param>
    internal static BvdFitResult Fit(ReadOnlySpan<double> hz, Complex[]? g, double[]? magnitude, double rextOhm, double c0StartF,
        double c0ScaleF, ArmGuess[] arms, int maxIterations)
    {
        var omega = new double[hz.Length];
        for (int i = 0; i < omega.Length; i++)
        {
            omega[i] = 2 * Math.PI * hz[i];
        }
        var fitter = new BvdFitter(omega, g, magnitude, rextOhm, c0ScaleF, arms);
        return fitter.Run(c0StartF / c0ScaleF, maxIterations);
    }

    private BvdFitResult Run(double c0Start, int maxIterations)
    {
        int m = 1 + 3 * _arms.Length;
        var x = new double[m];
        x[0] = c0Start;
        var jtj = new double[m * m];
        var jtr = new double[m];
        var trialJtj = new double[m * m];
        var trialJtr = new double[m];
        var trial = new double[m];
        var step = new double[m];
        var a = new double[m * m];

        double cost = Evaluate(x, jtj, jtr);
        double scale = Math.Max(SignalEnergy(), double.Epsilon);
        double lambda = 1e-3;
        bool converged = false;
        int iteration = 0;
        while (iteration < maxIterations)
        {
            iteration++;
            if (cost <= 1e-28 * scale)
            {
                converged = true;
                break;
            }
            double maxDiag = 0;
            for (int p = 0; p < m; p++)
            {
                maxDiag = Math.Max(maxDiag, jtj[p * m + p]);
            }
            Array.Copy(jtj, a, a.Length);
            for (int p = 0; p < m; p++)
            {
                // A floor on the diagonal keeps a parameter the data barely see (C0 of a series LC) from making the system singular.
                a[p * m + p] += lambda * Math.Max(jtj[p * m + p], 1e-12 * maxDiag);
                step[p] = -jtr[p];
            }
            if (!CholeskySolve(a, step, m))
            {
                lambda *= 10;
                continue;
            }
            double maxStep = 0;
            for (int p = 0; p < m; p++)
            {
                trial[p] = x[p] + step[p];
                maxStep = Math.Max(maxStep, Math.Abs(step[p]));
            }
            double trialCost = Evaluate(trial, trialJtj, trialJtr);
            if (trialCost < cost)
            {
                double gain = (cost - trialCost) / cost;
                (x, trial) = (trial, x);
                (jtj, trialJtj) = (trialJtj, jtj);
                (jtr, trialJtr) = (trialJtr, jtr);
                cost = trialCost;
                lambda = Math.Max(lambda / 3, 1e-12);
                if (maxStep < StepTolerance || gain < 1e-15)
                {
                    converged = true;
                    break;
                }
            }
            else
            {
                // No decrease: either the step was too bold (raise damping) or we already sit at the minimum.
                if (maxStep < StepTolerance || lambda > 1e10)
                {
                    converged = true;
                    break;
                }
                lambda *= 4;
            }
        }

        var fs = new double[_arms.Length];
        var r = new double[_arms.Length];
        var q = new double[_arms.Length];
        for (int k = 0; k < _arms.Length; k++)
        {
            (double ws, double rk, double qk) = Decode(x, k);
            fs[k] = ws / (2 * Math.PI);
            r[k] = rk;
            q[k] = qk;
        }
        return new BvdFitResult(fs, r, q, x[0] * _c0Scale, converged, iteration, Math.Sqrt(cost / _omega.Length));
    }

    private (double OmegaS, double R, double Q) Decode(ReadOnlySpan<double> x, int arm)
    {
        ArmGuess guess = _arms[arm];
        int at = 1 + 3 * arm;
        return (2 * Math.PI * (guess.FsHz + guess.BandwidthHz * x[at]), guess.ROhm * Math.Exp(x[at + 1]), guess.Q * Math.Exp(x[at + 2]));
    }

    private double SignalEnergy()
    {
        double sum = 0;
        if (_g is not null)
        {
            foreach (Complex v in _g)
            {
                sum += v.Real * v.Real + v.Imaginary * v.Imaginary;
            }
        }
        else
        {
            foreach (double v in _magnitude!)
            {
                sum += v * v;
            }
        }
        return sum;
    }

    /// <summary>Sum of squared residuals at <paramref name="x"/>, with JᵀJ and Jᵀr accumulated; +∞ for parameters out of range.</summary>
    private double Evaluate(double[] x, double[] jtj, double[] jtr)
    {
        int arms = _arms.Length;
        int m = x.Length;
        Span<double> ws = stackalloc double[arms];
        Span<double> rs = stackalloc double[arms];
        Span<double> qs = stackalloc double[arms];
        Span<double> dws = stackalloc double[arms];
        for (int k = 0; k < arms; k++)
        {
            if (Math.Abs(x[2 + 3 * k]) > 40 || Math.Abs(x[3 + 3 * k]) > 40)
            {
                return double.PositiveInfinity;
            }
            (ws[k], rs[k], qs[k]) = Decode(x, k);
            if (!(ws[k] > 0) || !double.IsFinite(ws[k]))
            {
                return double.PositiveInfinity;
            }
            dws[k] = 2 * Math.PI * _arms[k].BandwidthHz;
        }
        double c0 = x[0] * _c0Scale;
        Array.Clear(jtj);
        Array.Clear(jtr);
        Span<Complex> ya = stackalloc Complex[arms];
        Span<double> us = stackalloc double[arms];
        Span<double> jre = stackalloc double[m];
        Span<double> jim = stackalloc double[m];
        bool complexData = _g is not null;
        double cost = 0;
        for (int i = 0; i < _omega.Length; i++)
        {
            double w = _omega[i];
            var y = new Complex(0, w * c0);
            for (int k = 0; k < arms; k++)
            {
                double u = (w - ws[k]) * (w + ws[k]) / (w * ws[k]);
                us[k] = u;
                ya[k] = Complex.Reciprocal(new Complex(rs[k], rs[k] * qs[k] * u));
                y += ya[k];
            }
            Complex ay = _rext * y;
            Complex onePlus = 1 + ay;
            Complex model = ay / onePlus;
            Complex factor = _rext / (onePlus * onePlus);

            // dY/dθ for each parameter, then dg/dθ = factor·dY/dθ.
            Complex dg0 = factor * new Complex(0, w * _c0Scale);
            jre[0] = dg0.Real;
            jim[0] = dg0.Imaginary;
            for (int k = 0; k < arms; k++)
            {
                Complex y2 = ya[k] * ya[k];
                double rq = rs[k] * qs[k];
                Complex dFs = factor * y2 * new Complex(0, rq * (w / (ws[k] * ws[k]) + 1 / w) * dws[k]);
                Complex dR = -factor * ya[k];
                Complex dQ = -factor * y2 * new Complex(0, rq * us[k]);
                int at = 1 + 3 * k;
                jre[at] = dFs.Real;
                jim[at] = dFs.Imaginary;
                jre[at + 1] = dR.Real;
                jim[at + 1] = dR.Imaginary;
                jre[at + 2] = dQ.Real;
                jim[at + 2] = dQ.Imaginary;
            }

            if (complexData)
            {
                Complex res = model - _g![i];
                cost += res.Real * res.Real + res.Imaginary * res.Imaginary;
                for (int p = 0; p < m; p++)
                {
                    jtr[p] += jre[p] * res.Real + jim[p] * res.Imaginary;
                    int row = p * m;
                    for (int s = p; s < m; s++)
                    {
                        jtj[row + s] += jre[p] * jre[s] + jim[p] * jim[s];
                    }
                }
            }
            else
            {
                double mag = model.Magnitude;
                double res = mag - _magnitude![i];
                cost += res * res;
                // d|g|/dθ = Re(conj(g)·dg/dθ)/|g|; reuse jre for it.
                double inv = mag > 0 ? 1 / mag : 0;
                for (int p = 0; p < m; p++)
                {
                    jre[p] = (model.Real * jre[p] + model.Imaginary * jim[p]) * inv;
                }
                for (int p = 0; p < m; p++)
                {
                    jtr[p] += jre[p] * res;
                    int row = p * m;
                    for (int s = p; s < m; s++)
                    {
                        jtj[row + s] += jre[p] * jre[s];
                    }
                }
            }
        }
        for (int p = 0; p < m; p++)
        {
            for (int s = 0; s < p; s++)
            {
                jtj[p * m + s] = jtj[s * m + p];
            }
        }
        return double.IsFinite(cost) ? cost : double.PositiveInfinity;
    }

    /// <summary>Solves A·x = b in place (b becomes x) for symmetric positive definite A; false when A is not.</summary>
    private static bool CholeskySolve(double[] a, double[] b, int m)
    {
        for (int j = 0; j < m; j++)
        {
            double d = a[j * m + j];
            for (int k = 0; k < j; k++)
            {
                d -= a[j * m + k] * a[j * m + k];
            }
            if (!(d > 0))
            {
                return false;
            }
            d = Math.Sqrt(d);
            a[j * m + j] = d;
            for (int i = j + 1; i < m; i++)
            {
                double s = a[i * m + j];
                for (int k = 0; k < j; k++)
                {
                    s -= a[i * m + k] * a[j * m + k];
                }
                a[i * m + j] = s / d;
            }
        }
        for (int i = 0; i < m; i++)
        {
            double s = b[i];
            for (int k = 0; k < i; k++)
            {
                s -= a[i * m + k] * b[k];
            }
            b[i] = s / a[i * m + i];
        }
        for (int i = m - 1; i >= 0; i--)
        {
            double s = b[i];
            for (int k = i + 1; k < m; k++)
            {
                s -= a[k * m + i] * b[k];
            }
            b[i] = s / a[i * m + i];
        }
        return true;
    }
}
