using System.Globalization;
using MathNet.Numerics.Distributions;
using MathNet.Numerics.RootFinding;

namespace FilterQA.Core.Sampling;

/// <summary>
/// Operating characteristic of a single sampling plan (n, c): probability of acceptance Pa against
/// the lot's fraction defective p, risk points, AOQ and AOQL. Fractions are 0..1, not percent.
/// </summary>
public static class OperatingCharacteristic
{
    /// <summary>Binomial Pa = Σ_{k≤c} C(n,k)·p^k·(1−p)^(n−k).</summary>
    /// <param name="sampleSize">n ≥ 1.</param>
    /// <param name="acceptanceNumber">c ≥ 0.</param>
    /// <param name="fractionDefective">p, 0..1.</param>
    /// <exception cref="ArgumentOutOfRangeException">n below 1, c negative, p outside 0..1 or NaN.</exception>
    public static double Binomial(int sampleSize, int acceptanceNumber, double fractionDefective)
    {
        CheckPlan(sampleSize, acceptanceNumber);
        CheckFraction(fractionDefective);
        if (acceptanceNumber >= sampleSize || fractionDefective == 0)
        {
            return 1;
        }
        if (fractionDefective == 1)
        {
            return 0;
        }
        return Clamp(MathNet.Numerics.Distributions.Binomial.CDF(fractionDefective, sampleSize, acceptanceNumber));
    }

    /// <summary>Poisson approximation Pa = Σ_{k≤c} e^(−λ)·λ^k/k!, λ = n·p.</summary>
    /// <exception cref="ArgumentOutOfRangeException">n below 1, c negative, p outside 0..1 or NaN.</exception>
    public static double Poisson(int sampleSize, int acceptanceNumber, double fractionDefective)
    {
        CheckPlan(sampleSize, acceptanceNumber);
        CheckFraction(fractionDefective);
        if (fractionDefective == 0)
        {
            return 1;
        }
        return Clamp(MathNet.Numerics.Distributions.Poisson.CDF(sampleSize * fractionDefective, acceptanceNumber));
    }

    /// <summary>
    /// Hypergeometric Pa for an isolated lot of <paramref name="lotSize"/> units holding
    /// D = round(N·p) defectives (half away from zero), sampled without replacement.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">n below 1 or above N, c negative, p outside 0..1 or NaN.</exception>
    public static double Hypergeometric(int lotSize, int sampleSize, int acceptanceNumber, double fractionDefective)
    {
        CheckPlan(sampleSize, acceptanceNumber);
        CheckFraction(fractionDefective);
        if (lotSize < sampleSize)
        {
            throw new ArgumentOutOfRangeException(nameof(lotSize), lotSize,
                string.Create(CultureInfo.InvariantCulture, $"the lot must hold at least the sample size {sampleSize}"));
        }
        int defectivesInLot = (int)Math.Round(lotSize * fractionDefective, MidpointRounding.AwayFromZero);
        // Fewest defectives the sample can hold: max(0, n + D − N).
        if (acceptanceNumber >= Math.Min(sampleSize, defectivesInLot))
        {
            return 1;
        }
        if (acceptanceNumber < sampleSize + defectivesInLot - lotSize)
        {
            return 0;
        }
        return Clamp(MathNet.Numerics.Distributions.Hypergeometric.CDF(lotSize, defectivesInLot, sampleSize, acceptanceNumber));
    }

    /// <summary>Pa under <paramref name="model"/> for a plan; the hypergeometric model uses the plan's lot size.</summary>
    /// <exception cref="ArgumentOutOfRangeException">p outside 0..1 or NaN, or an undefined model.</exception>
    public static double AcceptanceProbability(SamplingPlan plan, double fractionDefective, OcModel model = OcModel.Binomial)
    {
        ArgumentNullException.ThrowIfNull(plan);
        return AcceptanceProbability(plan.LotSize, plan.SampleSize, plan.AcceptanceNumber, fractionDefective, model);
    }

    /// <summary>Pa under <paramref name="model"/>; <paramref name="lotSize"/> is used by the hypergeometric model only.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Bad n, c, N or p, or an undefined model.</exception>
    public static double AcceptanceProbability(int lotSize, int sampleSize, int acceptanceNumber, double fractionDefective, OcModel model) => model switch
    {
        OcModel.Binomial => Binomial(sampleSize, acceptanceNumber, fractionDefective),
        OcModel.Poisson => Poisson(sampleSize, acceptanceNumber, fractionDefective),
        OcModel.Hypergeometric => Hypergeometric(lotSize, sampleSize, acceptanceNumber, fractionDefective),
        _ => throw new ArgumentOutOfRangeException(nameof(model), model, "not a defined OC model"),
    };

    /// <summary>Average outgoing quality AOQ ≈ p·Pa·(N − n)/N (rejected lots are screened and defectives replaced), fraction.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Bad n, c, N or p, or an undefined model.</exception>
    public static double AverageOutgoingQuality(int lotSize, int sampleSize, int acceptanceNumber, double fractionDefective, OcModel model = OcModel.Binomial)
    {
        CheckLot(lotSize, sampleSize);
        double pa = AcceptanceProbability(lotSize, sampleSize, acceptanceNumber, fractionDefective, model);
        return fractionDefective * pa * (lotSize - sampleSize) / lotSize;
    }

    /// <summary>
    /// The OC curve at <paramref name="points"/> equally spaced fractions from
    /// <paramref name="fromFraction"/> to <paramref name="toFraction"/> inclusive, with AOQ at each.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">Fewer than 2 points, a range outside 0..1 or not increasing.</exception>
    public static OcCurve Curve(SamplingPlan plan, double fromFraction, double toFraction, int points, OcModel model = OcModel.Binomial)
    {
        ArgumentNullException.ThrowIfNull(plan);
        if (points < 2)
        {
            throw new ArgumentOutOfRangeException(nameof(points), points, "an OC curve needs at least 2 points");
        }
        CheckFraction(fromFraction);
        CheckFraction(toFraction);
        if (toFraction <= fromFraction)
        {
            throw new ArgumentOutOfRangeException(nameof(toFraction), toFraction,
                string.Create(CultureInfo.InvariantCulture, $"the end of the p range must be above its start {fromFraction}"));
        }
        var p = new double[points];
        var pa = new double[points];
        var aoq = new double[points];
        for (int i = 0; i < points; i++)
        {
            p[i] = i == points - 1 ? toFraction : fromFraction + (toFraction - fromFraction) * i / (points - 1);
            pa[i] = AcceptanceProbability(plan, p[i], model);
            aoq[i] = p[i] * pa[i] * (plan.LotSize - plan.SampleSize) / plan.LotSize;
        }
        return new OcCurve(model, p, pa, aoq);
    }

    /// <summary>
    /// The fraction defective at which Pa equals <paramref name="acceptanceProbability"/> (Brent
    /// root-finding to 1e-12 in p). Binomial and Poisson only: the hypergeometric Pa is a step
    /// function of p.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">Pa target outside (0, 1), hypergeometric model, or no p in 0..1 reaches it (c ≥ n, or Poisson with c near n).</exception>
    public static double FractionDefectiveAt(int sampleSize, int acceptanceNumber, double acceptanceProbability, OcModel model = OcModel.Binomial)
    {
        CheckPlan(sampleSize, acceptanceNumber);
        if (!(acceptanceProbability > 0 && acceptanceProbability < 1))
        {
            throw new ArgumentOutOfRangeException(nameof(acceptanceProbability), acceptanceProbability, "the target Pa must be strictly between 0 and 1");
        }
        if (model == OcModel.Hypergeometric || !Enum.IsDefined(model))
        {
            throw new ArgumentOutOfRangeException(nameof(model), model, "risk points are found for the binomial or Poisson model (the hypergeometric Pa is a step function of p)");
        }
        double F(double p) => AcceptanceProbability(0, sampleSize, acceptanceNumber, p, model) - acceptanceProbability;
        if (F(1) > 0)
        {
            throw new ArgumentOutOfRangeException(nameof(acceptanceProbability), acceptanceProbability, string.Create(CultureInfo.InvariantCulture,
                $"the plan n = {sampleSize}, c = {acceptanceNumber} keeps Pa above {acceptanceProbability} for every p up to 1 under the {model} model"));
        }
        return Brent.FindRoot(F, 0, 1, 1e-12, 200);
    }

    /// <summary>Producer's risk point: the p at which Pa = 1 − α (default α = 0.05, so p95).</summary>
    /// <exception cref="ArgumentOutOfRangeException">As <see cref="FractionDefectiveAt"/>.</exception>
    public static double ProducerRiskPoint(int sampleSize, int acceptanceNumber, double alpha = 0.05, OcModel model = OcModel.Binomial) =>
        FractionDefectiveAt(sampleSize, acceptanceNumber, 1 - alpha, model);

    /// <summary>Consumer's risk point: the p at which Pa = β (default β = 0.10, so p10, the LTPD).</summary>
    /// <exception cref="ArgumentOutOfRangeException">As <see cref="FractionDefectiveAt"/>.</exception>
    public static double ConsumerRiskPoint(int sampleSize, int acceptanceNumber, double beta = 0.10, OcModel model = OcModel.Binomial) =>
        FractionDefectiveAt(sampleSize, acceptanceNumber, beta, model);

    /// <summary>
    /// AOQL: the maximum over p of p·Pa(p)·(N − n)/N. Found on a grid of 2001 points over
    /// 0..1, then refined by golden-section search around the best grid point (AOQ is unimodal in p
    /// for these models); 0 when n = N.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">Bad n, c or N, or an undefined model.</exception>
    public static AoqlResult Aoql(int lotSize, int sampleSize, int acceptanceNumber, OcModel model = OcModel.Binomial)
    {
        CheckPlan(sampleSize, acceptanceNumber);
        CheckLot(lotSize, sampleSize);
        if (lotSize == sampleSize)
        {
            return new AoqlResult(0, 0);
        }
        double Aoq(double p) => AverageOutgoingQuality(lotSize, sampleSize, acceptanceNumber, p, model);
        const int grid = 2000;
        int best = 0;
        double bestValue = 0;
        for (int i = 1; i <= grid; i++)
        {
            double value = Aoq((double)i / grid);
            if (value > bestValue)
            {
                bestValue = value;
                best = i;
            }
        }
        double a = Math.Max(0, (best - 1.0) / grid), b = Math.Min(1, (best + 1.0) / grid);
        double ratio = (Math.Sqrt(5) - 1) / 2;
        double x1 = b - ratio * (b - a), x2 = a + ratio * (b - a);
        double f1 = Aoq(x1), f2 = Aoq(x2);
        for (int k = 0; k < 100 && b - a > 1e-13; k++)
        {
            if (f1 < f2)
            {
                a = x1; x1 = x2; f1 = f2; x2 = a + ratio * (b - a); f2 = Aoq(x2);
            }
            else
            {
                b = x2; x2 = x1; f2 = f1; x1 = b - ratio * (b - a); f1 = Aoq(x1);
            }
        }
        double at = (a + b) / 2;
        double refined = Aoq(at);
        return refined >= bestValue ? new AoqlResult(refined, at) : new AoqlResult(bestValue, (double)best / grid);
    }

    /// <summary>AOQL of a plan (its lot size, n and Ac).</summary>
    public static AoqlResult Aoql(SamplingPlan plan, OcModel model = OcModel.Binomial)
    {
        ArgumentNullException.ThrowIfNull(plan);
        return Aoql(plan.LotSize, plan.SampleSize, plan.AcceptanceNumber, model);
    }

    private static double Clamp(double value) => Math.Clamp(value, 0, 1);

    private static void CheckPlan(int sampleSize, int acceptanceNumber)
    {
        if (sampleSize < 1)
        {
            throw new ArgumentOutOfRangeException(nameof(sampleSize), sampleSize, "the sample size must be at least 1");
        }
        if (acceptanceNumber < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(acceptanceNumber), acceptanceNumber, "the acceptance number must not be negative");
        }
    }

    private static void CheckLot(int lotSize, int sampleSize)
    {
        if (lotSize < sampleSize)
        {
            throw new ArgumentOutOfRangeException(nameof(lotSize), lotSize,
                string.Create(CultureInfo.InvariantCulture, $"the lot must hold at least the sample size {sampleSize}"));
        }
    }

    private static void CheckFraction(double fraction)
    {
        if (!(fraction >= 0 && fraction <= 1))
        {
            throw new ArgumentOutOfRangeException(nameof(fraction), fraction, "a fraction defective must be between 0 and 1 (0.01 = 1 %)");
        }
    }
}
