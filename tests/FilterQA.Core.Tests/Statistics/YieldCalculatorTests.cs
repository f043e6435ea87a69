using FilterQA.Core.Statistics;

namespace FilterQA.Core.Tests.Statistics;

// Yield definitions (first pass = go on the first measurement / tested; final = go on the final
// measurement allowed by the retest policy / tested): common practice, no published source.
public sealed class YieldCalculatorTests
{
    private static readonly IReadOnlyList<bool>[] Units =
    [
        [true],               // go first time
        [false, true],        // go on the retest
        [false, false, true], // go only on the second retest
        [false],              // no-go, not retested
    ];

    [Fact]
    public void One_retest_allowed()
    {
        LotYield y = YieldCalculator.Compute(Units, new RetestPolicy(1));
        Assert.Equal(4, y.UnitsTested);
        Assert.Equal(1, y.FirstPassGo);
        Assert.Equal(2, y.FinalGo);             // units 0 and 1; unit 2's third measurement is beyond policy
        Assert.Equal(1, y.UnitsBeyondPolicy);
        Assert.Equal(2, y.UnitsRetested);
        Assert.Equal(0.25, y.FirstPassYield, 1e-15); // 1/4 exactly
        Assert.Equal(0.5, y.FinalYield, 1e-15);      // 2/4 exactly
    }

    [Fact]
    public void Two_retests_allowed_count_the_third_measurement()
    {
        LotYield y = YieldCalculator.Compute(Units, new RetestPolicy(2));
        Assert.Equal(3, y.FinalGo);
        Assert.Equal(0, y.UnitsBeyondPolicy);
        Assert.Equal(0.75, y.FinalYield, 1e-15);
    }

    [Fact]
    public void No_retests_final_equals_first_pass()
    {
        LotYield y = YieldCalculator.Compute(Units);
        Assert.Equal(y.FirstPassGo, y.FinalGo);
        Assert.Equal(2, y.UnitsBeyondPolicy);
    }

    [Fact]
    public void No_units_gives_NaN_yield_and_a_unit_without_measurements_is_refused()
    {
        Assert.True(double.IsNaN(YieldCalculator.Compute([]).FinalYield));
        var error = Assert.Throws<ArgumentException>(() => YieldCalculator.Compute([[true], []]));
        Assert.Contains("index 1", error.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentOutOfRangeException>(() => new RetestPolicy(-1));
    }
}
