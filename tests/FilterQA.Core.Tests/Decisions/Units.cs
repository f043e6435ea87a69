using System.Numerics;
using FilterQA.Core.Decisions;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;

namespace FilterQA.Core.Tests.Decisions;

/// <summary>Hand-built sweeps and templates for the engine tests; every value is written here, none comes from the engine.</summary>
internal static class Units
{
    /// <summary>A scalar gain sweep whose loss (dB, positive) is <paramref name="lossDb"/> at each frequency.</summary>
    public static Sweep Scalar(Func<double, double> lossDb, FrequencyGrid grid, Func<double, double>? phaseDeg = null)
    {
        var level = new double[grid.Count];
        double[]? phase = phaseDeg is null ? null : new double[grid.Count];
        for (int i = 0; i < level.Length; i++)
        {
            level[i] = -lossDb(grid[i]);
            if (phase is not null)
            {
                phase[i] = phaseDeg!(grid[i]);
            }
        }
        return Sweep.FromScalar(ScalarTrace.Create(grid, ScalarQuantity.GainDb, level, phase), SweepSource.Of("unit.csv", SweepFormat.DelimitedText));
    }

    /// <summary>A two-port sweep from S21 (= S12) and S11 (= S22) written as functions of frequency.</summary>
    public static Sweep TwoPort(FrequencyGrid grid, Func<double, Complex> s21, Func<double, Complex> s11, double referenceOhm = 50)
    {
        var s = new Complex[grid.Count, 2, 2];
        for (int i = 0; i < grid.Count; i++)
        {
            s[i, 0, 0] = s11(grid[i]);
            s[i, 1, 1] = s11(grid[i]);
            s[i, 1, 0] = s21(grid[i]);
            s[i, 0, 1] = s21(grid[i]);
        }
        return Sweep.FromNetwork(NetworkData.Create(grid, s, [referenceOhm, referenceOhm]), SweepSource.Of("unit.s2p", SweepFormat.Touchstone1));
    }

    /// <summary>
    /// A trapezoid passband: <paramref name="ilDb"/> flat within ± <paramref name="flatHalfHz"/> of <paramref name="centreHz"/>,
    /// rising linearly to <paramref name="stopDb"/> at ± <paramref name="skirtHalfHz"/>, flat beyond. Linear in dB
    /// against frequency, so edges found by linear interpolation are exact.
    /// </summary>
    public static Func<double, double> Trapezoid(double centreHz, double flatHalfHz, double skirtHalfHz, double ilDb, double stopDb) => hz =>
    {
        double d = Math.Abs(hz - centreHz);
        return d <= flatHalfHz ? ilDb
            : d >= skirtHalfHz ? stopDb
            : ilDb + (stopDb - ilDb) * (d - flatHalfHz) / (skirtHalfHz - flatHalfHz);
    };

    /// <summary>A draft template around <paramref name="nominalHz"/> whose sweep requirements the given grid meets unless changed.</summary>
    public static LimitTemplate Template(DecisionRule decisionRule, double nominalHz, double spanStartHz, double spanStopHz,
        IEnumerable<LimitRule> rules, DeviceKind device = DeviceKind.BandpassFilter, double narrowestFeatureHz = 1e9, int pointsPerFeature = 1,
        double maximumThruAgeS = 8 * 3600, bool needsPhase = false, bool needsS11 = false, bool needsS22 = false) =>
        LimitTemplate.Create("TEST-PART", 1, "test part", device, nominalHz, TemplateStatus.Draft, null, null,
            new SweepRequirements(spanStartHz, spanStopHz, narrowestFeatureHz, pointsPerFeature, maximumThruAgeS, needsPhase, needsS11, needsS22),
            decisionRule, rules);

    public static UnitEvaluation Evaluate(LimitTemplate template, Sweep sweep, TimeSpan? thruAge = null, IReadOnlyList<double>? floor = null) =>
        TemplateEvaluator.Evaluate(template, MeasurementInput.FromSweep(sweep, thruAge: thruAge ?? TimeSpan.FromHours(1), floorLossDb: floor));

    public static RuleResult Only(UnitEvaluation evaluation) => Assert.Single(evaluation.Rules);
}
