using FilterQA.Core.Sampling;

namespace FilterQA.Core.Tests.Sampling;

public sealed class LotDispositionTests
{
    // MIL-STD-105E Table II-A, lot 1000, level II, AQL 1.0: n = 80, Ac 2, Re 3.
    private static readonly SamplingPlan Normal80 = SamplingPlanner.Mil105E(1000, InspectionLevel.II, InspectionSeverity.Normal, 1.0);

    [Theory]
    [InlineData(80, 0, LotDecision.Accept)]
    [InlineData(80, 2, LotDecision.Accept)]        // defectives = Ac: accept
    [InlineData(80, 3, LotDecision.Reject)]        // defectives = Re: reject
    [InlineData(80, 7, LotDecision.Reject)]
    [InlineData(40, 2, LotDecision.Pending)]       // incomplete, below Re
    [InlineData(40, 3, LotDecision.RejectDecided)] // Re reached early: rejection decided
    [InlineData(0, 0, LotDecision.Pending)]
    public void Decide_applies_Ac_and_Re(int inspected, int defectives, LotDecision expected)
    {
        Assert.Equal(expected, LotDisposition.Decide(Normal80, inspected, defectives));
    }

    [Fact]
    public void Decide_without_early_rejection_waits_for_the_complete_sample()
    {
        Assert.Equal(LotDecision.Pending, LotDisposition.Decide(Normal80, 40, 3, allowEarlyRejection: false));
        Assert.Equal(LotDecision.Reject, LotDisposition.Decide(Normal80, 80, 3, allowEarlyRejection: false));
    }

    [Theory]
    [InlineData(1, LotDecision.Accept)]
    [InlineData(2, LotDecision.AcceptReturnToNormal)] // Table II-C J at 1.0 is 1/3: 2 is in the gap (Re from memory)
    [InlineData(3, LotDecision.Reject)]
    public void Decide_on_reduced_accepts_in_the_gap_and_returns_to_normal(int defectives, LotDecision expected)
    {
        SamplingPlan reduced = SamplingPlanner.Mil105E(1000, InspectionLevel.II, InspectionSeverity.Reduced, 1.0);
        Assert.Equal(expected, LotDisposition.DecideComplete(reduced, defectives));
    }

    [Theory]
    [InlineData(81, 0)]
    [InlineData(-1, 0)]
    [InlineData(10, 11)]
    [InlineData(10, -1)]
    public void Decide_rejects_impossible_counts(int inspected, int defectives)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => LotDisposition.Decide(Normal80, inspected, defectives));
    }
}
