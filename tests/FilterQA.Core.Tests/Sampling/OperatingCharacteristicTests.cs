using System.Numerics;
using FilterQA.Core.Sampling;

namespace FilterQA.Core.Tests.Sampling;

public sealed class OperatingCharacteristicTests
{
    // Worked example values are printed to 3 decimals: a tolerance of half the last digit.
    private const double ThreeDecimals = 0.0005;

    // Direct sums, written here independently of the engine and of MathNet.
    private static double BinomialSum(int n, int c, double p)
    {
        double sum = 0, choose = 1; // C(n, 0)
        for (int k = 0; k <= c; k++)
        {
            sum += choose * Math.Pow(p, k) * Math.Pow(1 - p, n - k);
            choose = choose * (n - k) / (k + 1);
        }
        return sum;
    }

    private static double PoissonSum(double lambda, int c)
    {
        double term = Math.Exp(-lambda), sum = 0;
        for (int k = 0; k <= c; k++)
        {
            sum += term;
            term *= lambda / (k + 1);
        }
        return sum;
    }

    private static BigInteger Choose(int n, int k)
    {
        if (k < 0 || k > n)
        {
            return BigInteger.Zero;
        }
        BigInteger r = BigInteger.One;
        for (int i = 1; i <= k; i++)
        {
            r = r * (n - k + i) / i;
        }
        return r;
    }

    private static double HypergeometricSum(int lot, int defectivesInLot, int n, int c)
    {
        BigInteger favourable = BigInteger.Zero;
        for (int k = 0; k <= c; k++)
        {
            favourable += Choose(defectivesInLot, k) * Choose(lot - defectivesInLot, n - k);
        }
        // Scale before dividing so the quotient keeps 15 digits.
        BigInteger scaled = favourable * BigInteger.Pow(10, 18) / Choose(lot, n);
        return (double)scaled / 1e18;
    }

    [Theory]
    [InlineData(0.01, 0.953, 0.953, 0.961)] // DOMAIN worked example 7 (worked example, computed): n = 80, c = 2
    [InlineData(0.02, 0.784, 0.783, 0.789)]
    [InlineData(0.05, 0.231, 0.238, 0.219)]
    public void Worked_example_7_n80_c2(double p, double binomial, double poisson, double hypergeometricN1000)
    {
        Assert.Equal(binomial, OperatingCharacteristic.Binomial(80, 2, p), ThreeDecimals);
        Assert.Equal(poisson, OperatingCharacteristic.Poisson(80, 2, p), ThreeDecimals);
        Assert.Equal(hypergeometricN1000, OperatingCharacteristic.Hypergeometric(1000, 80, 2, p), ThreeDecimals);
    }

    [Fact]
    public void Worked_example_7_c0_at_1_percent()
    {
        // DOMAIN worked example 7: n = 80, c = 0, p = 1 % -> 0.448 (3 decimals); also 0.99^80 exactly.
        Assert.Equal(0.448, OperatingCharacteristic.Binomial(80, 0, 0.01), ThreeDecimals);
        Assert.Equal(Math.Pow(0.99, 80), OperatingCharacteristic.Binomial(80, 0, 0.01), 1e-12);
    }

    [Theory]
    [InlineData(80, 2, 0.013)]
    [InlineData(125, 3, 0.021)]
    [InlineData(13, 0, 0.1)]
    [InlineData(200, 10, 0.04)]
    [InlineData(2000, 21, 0.008)]
    public void Binomial_matches_the_closed_form_sum(int n, int c, double p)
    {
        // Pa = sum_{k<=c} C(n,k) p^k (1-p)^(n-k), looped above; 1e-10 covers rounding in both sums.
        Assert.Equal(BinomialSum(n, c, p), OperatingCharacteristic.Binomial(n, c, p), 1e-10);
    }

    [Theory]
    [InlineData(80, 2, 0.013)]
    [InlineData(315, 7, 0.02)]
    public void Poisson_matches_the_direct_sum(int n, int c, double p)
    {
        // Pa = sum_{k<=c} e^-λ λ^k / k!, λ = n p; 1e-10 for rounding.
        Assert.Equal(PoissonSum(n * p, c), OperatingCharacteristic.Poisson(n, c, p), 1e-10);
    }

    [Theory]
    [InlineData(1000, 80, 2, 0.03)]
    [InlineData(500, 50, 1, 0.01)]
    [InlineData(100, 20, 0, 0.05)]
    public void Hypergeometric_matches_exact_counting(int lot, int n, int c, double p)
    {
        // Pa = sum_k C(D,k) C(N-D,n-k) / C(N,n) with D = N p, counted in exact integers; 1e-10 for rounding.
        int d = (int)Math.Round(lot * p);
        Assert.Equal(HypergeometricSum(lot, d, n, c), OperatingCharacteristic.Hypergeometric(lot, n, c, p), 1e-10);
    }

    [Fact]
    public void Edges_p0_gives_1_and_p1_gives_0()
    {
        Assert.Equal(1, OperatingCharacteristic.Binomial(80, 2, 0));
        Assert.Equal(0, OperatingCharacteristic.Binomial(80, 2, 1));
        Assert.Equal(1, OperatingCharacteristic.Poisson(80, 2, 0));
        Assert.Equal(1, OperatingCharacteristic.Hypergeometric(1000, 80, 2, 0));
        // All 1000 units defective: every sample holds 80 defectives.
        Assert.Equal(0, OperatingCharacteristic.Hypergeometric(1000, 80, 2, 1));
    }

    [Fact]
    public void Curve_holds_Pa_and_AOQ_over_the_range()
    {
        SamplingPlan plan = SamplingPlanner.Mil105E(1000, InspectionLevel.II, InspectionSeverity.Normal, 1.0); // II-A J: 80, 2/3
        OcCurve curve = OperatingCharacteristic.Curve(plan, 0, 0.10, 11);
        Assert.Equal(11, curve.Count);
        Assert.Equal(0.10, curve.FractionDefective[10]);
        for (int i = 0; i < curve.Count; i++)
        {
            double p = 0.01 * i;
            Assert.Equal(p, curve.FractionDefective[i], 1e-15);
            double pa = BinomialSum(80, 2, p);
            Assert.Equal(pa, curve.AcceptanceProbability[i], 1e-10);
            Assert.Equal(p * pa * (1000 - 80) / 1000.0, curve.AverageOutgoingQuality[i], 1e-10); // AOQ = p Pa (N - n)/N
        }
    }

    [Theory]
    [InlineData(13)]
    [InlineData(80)]
    [InlineData(230)]
    public void Risk_points_for_c0_match_the_closed_form(int n)
    {
        // c = 0 binomial: Pa = (1 - p)^n, so p at Pa = q is 1 - q^(1/n). Brent stops at 1e-12 in p.
        Assert.Equal(1 - Math.Pow(0.95, 1.0 / n), OperatingCharacteristic.ProducerRiskPoint(n, 0), 1e-10);
        Assert.Equal(1 - Math.Pow(0.10, 1.0 / n), OperatingCharacteristic.ConsumerRiskPoint(n, 0), 1e-10);
    }

    [Fact]
    public void Risk_points_for_n80_c2_give_Pa_095_and_010_in_the_direct_sum()
    {
        double p95 = OperatingCharacteristic.ProducerRiskPoint(80, 2);
        double p10 = OperatingCharacteristic.ConsumerRiskPoint(80, 2);
        // Pa checked by the looped binomial sum; 1e-9 covers the root tolerance times the OC slope.
        Assert.Equal(0.95, BinomialSum(80, 2, p95), 1e-9);
        Assert.Equal(0.10, BinomialSum(80, 2, p10), 1e-9);
        Assert.InRange(p95, 0.01, 0.02); // worked example 7: Pa(1 %) = 0.953 > 0.95 > Pa(2 %) = 0.784
        Assert.InRange(p10, 0.05, 0.10); // Pa(5 %) = 0.231 > 0.10
    }

    [Fact]
    public void Risk_point_is_refused_for_hypergeometric_and_for_a_plan_that_never_rejects()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => OperatingCharacteristic.ProducerRiskPoint(80, 2, model: OcModel.Hypergeometric));
        Assert.Throws<ArgumentOutOfRangeException>(() => OperatingCharacteristic.ConsumerRiskPoint(5, 5));
    }

    [Theory]
    [InlineData(1000, 80)]
    [InlineData(5000, 230)]
    [InlineData(100, 13)]
    public void Aoql_for_c0_matches_the_closed_form(int lot, int n)
    {
        // c = 0 binomial: AOQ = p (1-p)^n (N-n)/N has its maximum at p = 1/(n+1) (derivative zero),
        // so AOQL = (1/(n+1)) (n/(n+1))^n (N-n)/N. Golden-section to 1e-13 in p: 1e-12 on the value.
        double expected = 1.0 / (n + 1) * Math.Pow((double)n / (n + 1), n) * (lot - n) / lot;
        AoqlResult aoql = OperatingCharacteristic.Aoql(lot, n, 0);
        Assert.Equal(expected, aoql.AoqlFraction, 1e-12);
        Assert.Equal(1.0 / (n + 1), aoql.AtFractionDefective, 1e-5); // flat maximum: p known to ~sqrt of the value tolerance
    }

    [Fact]
    public void Aoql_for_n80_c2_is_the_maximum_of_the_AOQ_grid()
    {
        // Compare with a brute-force scan of AOQ (looped binomial) at 1e-5 steps: the refined maximum
        // must be at least the scan's and no more than 1e-9 above it (the scan's step error).
        double best = 0;
        for (int i = 0; i <= 20000; i++)
        {
            double p = i * 1e-5;
            best = Math.Max(best, p * BinomialSum(80, 2, p) * 920 / 1000);
        }
        double aoql = OperatingCharacteristic.Aoql(1000, 80, 2).AoqlFraction;
        Assert.InRange(aoql, best - 1e-12, best + 1e-9);
    }

    [Fact]
    public void Aoql_is_zero_for_100_percent_inspection()
    {
        Assert.Equal(0, OperatingCharacteristic.Aoql(SamplingPlanner.FullInspection(50)).AoqlFraction);
    }

    [Theory]
    [InlineData(-0.1)]
    [InlineData(1.1)]
    [InlineData(double.NaN)]
    public void Fraction_outside_0_to_1_is_rejected(double p)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => OperatingCharacteristic.Binomial(80, 2, p));
    }
}
