using FilterQA.Core.Statistics;
using MathNet.Numerics;

namespace FilterQA.Core.Tests.Statistics;

public sealed class LotTrendTests
{
    private static readonly DateTimeOffset Day0 = new(2026, 3, 2, 8, 0, 0, TimeSpan.Zero);

    [Fact]
    public void Points_are_put_in_time_order_and_series_follow_it()
    {
        LotTrend trend = LotTrend.Create("CentreHz",
        [
            new("L3", Day0.AddDays(2), 10.7074e6, 1.40, 0.95, 0.98),
            new("L1", Day0, 10.7070e6, 1.55, 0.97, 0.99),
            new("L2", Day0.AddDays(1), 10.7072e6, null, 0.96, 0.99),
        ]);
        Assert.Equal(["L1", "L2", "L3"], trend.Points.Select(p => p.LotId));
        Assert.Equal([10.7070e6, 10.7072e6, 10.7074e6], trend.Means());
        Assert.True(double.IsNaN(trend.Cpks()[1]));
    }

    [Fact]
    public void SlopePerLot_matches_MathNet_least_squares()
    {
        // Reference library: MathNet Fit.Line (intercept, slope) on lot numbers 0..n-1; 1e-12 relative.
        double[] y = [10.7070e6, 10.7073e6, 10.7071e6, 10.7076e6, 10.7078e6];
        double slope = Fit.Line([0, 1, 2, 3, 4], y).B;
        Assert.Equal(slope, LotTrend.SlopePerLot(y), Math.Abs(slope) * 1e-9);
        // NaN (no Cpk) is skipped: fit through lots 0, 2, 3 only.
        double skipped = Fit.Line([0, 2, 3], [1.5, 1.3, 1.2]).B;
        Assert.Equal(skipped, LotTrend.SlopePerLot([1.5, double.NaN, 1.3, 1.2]), 1e-12);
        Assert.True(double.IsNaN(LotTrend.SlopePerLot([1.0])));
    }

    [Fact]
    public void Repeated_lot_or_bad_yield_is_refused()
    {
        Assert.Throws<ArgumentException>(() => LotTrend.Create("X", [new("L1", Day0, 1, null, 1, 1), new("L1", Day0, 1, null, 1, 1)]));
        Assert.Throws<ArgumentException>(() => LotTrend.Create("X", [new("L1", Day0, 1, null, 1.2, 1)]));
    }
}
