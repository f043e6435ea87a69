using FilterQA.Core.Sweeps;
using FilterQA.Web.Ui.Charts;

namespace FilterQA.Web.Ui.Tests.Charts;

public sealed class EnvelopeDecimatorTests
{
    private static ResponseTrace Trace(double[] hz, double[] lossDb) =>
        ResponseTrace.Create(FrequencyGrid.FromHz(hz), ResponsePath.Transmission, lossDb);

    // The expected envelope by the definition, computed point by point against explicit bin edges:
    // bin b holds the points with lo_b <= f < hi_b (the last bin also f = stop), lo_b = start + b (stop - start) / K.
    // Written without the decimator's index formula, so the two computations are independent.
    private static (double[] Min, double[] Max, int[] Count) ByDefinition(IReadOnlyList<(double[] Hz, double[] Loss)> traces, int bins)
    {
        double start = traces.Min(t => t.Hz[0]);
        double stop = traces.Max(t => t.Hz[^1]);
        var min = Enumerable.Repeat(double.NaN, bins).ToArray();
        var max = Enumerable.Repeat(double.NaN, bins).ToArray();
        var count = new int[bins];
        for (int b = 0; b < bins; b++)
        {
            double lo = start + b * (stop - start) / bins;
            double hi = start + (b + 1) * (stop - start) / bins;
            foreach ((double[] hz, double[] loss) in traces)
            {
                for (int i = 0; i < hz.Length; i++)
                {
                    bool inside = hz[i] >= lo && (hz[i] < hi || (b == bins - 1 && hz[i] <= stop));
                    if (inside)
                    {
                        min[b] = double.IsNaN(min[b]) ? loss[i] : Math.Min(min[b], loss[i]);
                        max[b] = double.IsNaN(max[b]) ? loss[i] : Math.Max(max[b], loss[i]);
                        count[b]++;
                    }
                }
            }
        }
        return (min, max, count);
    }

    [Fact]
    public void Two_traces_on_different_grids_give_the_min_and_max_of_each_bin()
    {
        // Hand-made: trace A on 100..1000 Hz every 100 Hz, trace B on 150..950 Hz every 200 Hz (offset grid).
        double[] hzA = [100, 200, 300, 400, 500, 600, 700, 800, 900, 1000];
        double[] lossA = [40, 30, 3, 1, 0.5, 0.7, 2, 25, 38, 45];
        double[] hzB = [150, 350, 550, 750, 950];
        double[] lossB = [35, 0.8, 0.2, 12, 50];
        LossEnvelope envelope = EnvelopeDecimator.Decimate([Trace(hzA, lossA), Trace(hzB, lossB)], 3);
        var (min, max, count) = ByDefinition([(hzA, lossA), (hzB, lossB)], 3);

        // Exact: the envelope copies measured values, it computes none (tolerance 0).
        Assert.Equal(min, envelope.MinLossDb.ToArray());
        Assert.Equal(max, envelope.MaxLossDb.ToArray());
        Assert.Equal(count, envelope.PointCounts.ToArray());
        Assert.Equal(2, envelope.TraceCount);
        // Bins of 300 Hz from 100 Hz: centres 250, 550, 850 Hz; within 1e-9 Hz for the floating-point sums.
        Assert.Equal([250.0, 550.0, 850.0], envelope.BinCentreHz.ToArray(), new Tolerance(1e-9));
    }

    [Fact]
    public void By_hand_the_first_bin_of_the_two_traces_holds_their_extremes_below_400_hz()
    {
        // Bin 0 is [100, 400) Hz: A gives 40, 30, 3 (100, 200, 300 Hz), B gives 35, 0.8 (150, 350 Hz).
        // So min 0.8, max 40, 5 points: read off the numbers above by hand.
        LossEnvelope envelope = EnvelopeDecimator.Decimate(
            [Trace([100, 200, 300, 400, 1000], [40, 30, 3, 1, 45]), Trace([150, 350, 950], [35, 0.8, 50])], 3);
        Assert.Equal(0.8, envelope.MinLossDb[0]);
        Assert.Equal(40, envelope.MaxLossDb[0]);
        Assert.Equal(5, envelope.PointCounts[0]);
    }

    [Fact]
    public void A_bin_no_point_falls_in_is_empty_and_the_stop_frequency_is_in_the_last_bin()
    {
        // Points at 0, 1 and 10 Hz in 10 bins of 1 Hz: bins 2..8 are empty; 10 Hz (the stop) goes to bin 9.
        LossEnvelope envelope = EnvelopeDecimator.Decimate([Trace([0, 1, 10], [5, 6, 7])], 10);
        var (min, max, count) = ByDefinition([([0, 1, 10], [5, 6, 7])], 10);
        Assert.Equal(count, envelope.PointCounts.ToArray());
        Assert.Equal(0, envelope.PointCounts[5]);
        Assert.True(double.IsNaN(envelope.MinLossDb[5]));
        Assert.True(double.IsNaN(envelope.MaxLossDb[5]));
        Assert.Equal(7, envelope.MaxLossDb[9]);
        Assert.Equal(min, envelope.MinLossDb.ToArray());
        Assert.Equal(max, envelope.MaxLossDb.ToArray());
    }

    [Fact]
    public void Every_point_lands_in_exactly_one_bin()
    {
        // Three traces of 7, 11 and 13 points on different spans: the counts add up to 31.
        ResponseTrace[] traces =
        [
            Trace([.. Enumerable.Range(0, 7).Select(i => 1e6 + i * 1e5)], [.. Enumerable.Range(0, 7).Select(i => (double)i)]),
            Trace([.. Enumerable.Range(0, 11).Select(i => 0.9e6 + i * 1.1e5)], [.. Enumerable.Range(0, 11).Select(i => 2.0 * i)]),
            Trace([.. Enumerable.Range(0, 13).Select(i => 1.05e6 + i * 0.5e5)], [.. Enumerable.Range(0, 13).Select(i => 0.5 * i)]),
        ];
        LossEnvelope envelope = EnvelopeDecimator.Decimate(traces, 17);
        Assert.Equal(31, envelope.PointCounts.Sum());
        Assert.Equal(17, envelope.BinCount);
    }

    [Fact]
    public void No_traces_give_the_empty_envelope()
    {
        LossEnvelope envelope = EnvelopeDecimator.Decimate([], 10);
        Assert.Equal(0, envelope.BinCount);
        Assert.Equal(0, envelope.TraceCount);
    }

    [Fact]
    public void Traces_at_one_frequency_give_one_bin()
    {
        LossEnvelope envelope = EnvelopeDecimator.Decimate([Trace([455e3], [3]), Trace([455e3], [4])], 10);
        Assert.Equal(1, envelope.BinCount);
        Assert.Equal(3, envelope.MinLossDb[0]);
        Assert.Equal(4, envelope.MaxLossDb[0]);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(-3)]
    public void A_bin_count_below_one_is_refused(int bins) =>
        Assert.Throws<ArgumentOutOfRangeException>(() => EnvelopeDecimator.Decimate([Trace([1, 2], [1, 2])], bins));

    private sealed class Tolerance(double absolute) : IEqualityComparer<double>
    {
        public bool Equals(double x, double y) => Math.Abs(x - y) <= absolute;

        public int GetHashCode(double obj) => 0;
    }
}
