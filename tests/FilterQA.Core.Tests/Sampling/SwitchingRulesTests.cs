using FilterQA.Core.Sampling;

namespace FilterQA.Core.Tests.Sampling;

// Switching rules of MIL-STD-105E / ANSI/ASQ Z1.4 / ISO 2859-1 (section "Switching rules" of the
// domain notes, confirmed in a source unless marked). Lots are written as a string: A = accepted,
// R = rejected, G = accepted between Ac and Re (reduced), U = accepted with irregular production.
public sealed class SwitchingRulesTests
{
    private static List<LotOutcome> Lots(string pattern, int sampleSize = 80, int defectivesWhenAccepted = 0, int? ac = null)
    {
        var lots = new List<LotOutcome>();
        foreach (char c in pattern)
        {
            lots.Add(c switch
            {
                'A' => new LotOutcome(true, defectivesWhenAccepted, sampleSize) { AcceptanceNumber = ac },
                'R' => new LotOutcome(false, 3, sampleSize) { AcceptanceNumber = ac },
                'G' => new LotOutcome(true, 2, sampleSize) { BetweenAcAndRe = true, AcceptanceNumber = ac },
                'U' => new LotOutcome(true, 0, sampleSize) { ProductionSteady = false, AcceptanceNumber = ac },
                _ => throw new ArgumentException("bad pattern letter " + c),
            });
        }
        return lots;
    }

    [Fact]
    public void Empty_history_is_the_initial_severity()
    {
        SwitchingState state = SwitchingRules.Evaluate([]);
        Assert.Equal(InspectionSeverity.Normal, state.Severity);
        Assert.Null(state.LastEvent);
        Assert.False(state.IsDiscontinued);
    }

    [Theory]
    [InlineData("RR", 1)]    // 2 of 2 consecutive lots rejected
    [InlineData("RAR", 2)]   // 2 of 3
    [InlineData("RAAAR", 4)] // 2 of 5: the window's limit
    [InlineData("AARAAAR", 6)]
    public void Normal_to_tightened_when_2_of_at_most_5_consecutive_lots_are_rejected(string pattern, int switchLot)
    {
        SwitchingState state = SwitchingRules.Evaluate(Lots(pattern));
        Assert.Equal(InspectionSeverity.Tightened, state.Severity);
        Assert.Equal(switchLot, state.LastEvent!.LotIndex);
        Assert.Equal(InspectionSeverity.Normal, state.LastEvent.From);
        Assert.Contains("2 lots rejected", state.Reason, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("RAAAAR")]     // the two rejections are 6 lots apart
    [InlineData("RAAAARAAAAR")]
    [InlineData("AAAAAAAAR")]
    public void Normal_stays_when_rejections_are_more_than_5_lots_apart(string pattern)
    {
        Assert.Equal(InspectionSeverity.Normal, SwitchingRules.Evaluate(Lots(pattern)).Severity);
    }

    [Fact]
    public void Tightened_to_normal_after_5_consecutive_accepted_lots()
    {
        // RR -> tightened from lot 2; AAAA not yet; the fifth A (lot 6) switches back.
        SwitchingState four = SwitchingRules.Evaluate(Lots("RRAAAA"));
        Assert.Equal(InspectionSeverity.Tightened, four.Severity);
        Assert.Equal(4, four.ConsecutiveAccepted);
        SwitchingState five = SwitchingRules.Evaluate(Lots("RRAAAAA"));
        Assert.Equal(InspectionSeverity.Normal, five.Severity);
        Assert.Equal(6, five.LastEvent!.LotIndex);
        Assert.Equal(
            [InspectionSeverity.Normal, InspectionSeverity.Normal, InspectionSeverity.Tightened, InspectionSeverity.Tightened,
             InspectionSeverity.Tightened, InspectionSeverity.Tightened, InspectionSeverity.Tightened],
            five.SeverityByLot);
    }

    [Fact]
    public void A_rejection_on_tightened_restarts_the_run_of_5()
    {
        SwitchingState state = SwitchingRules.Evaluate(Lots("RRAAAARAAAA"));
        Assert.Equal(InspectionSeverity.Tightened, state.Severity);
        // Tightened from lot 2: lots 2-5 accepted (4), lot 6 rejected, lots 7-10 accepted (4 again).
        Assert.Equal(1, state.RejectedOnTightened);
        Assert.Equal(4, state.ConsecutiveAccepted);
    }

    [Fact]
    public void Discontinued_after_5_rejections_on_tightened_by_default()
    {
        // Z1.4 / ISO 2859-1: cumulative 5 lots rejected during tightened inspection.
        List<LotOutcome> lots = Lots("RR" + "RARARARAR"); // tightened from lot 2; rejections at lots 2, 4, 6, 8, 10
        SwitchingState state = SwitchingRules.Evaluate(lots);
        Assert.True(state.IsDiscontinued);
        Assert.Equal(10, state.LastEvent!.LotIndex);
        Assert.True(state.LastEvent.Discontinues);
        var error = Assert.Throws<ArgumentException>(() => SwitchingRules.Evaluate(Lots("RRRARARARARA")));
        Assert.Contains("lot 11", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Ten_lots_on_tightened_discontinue_under_the_105E_rule_only()
    {
        // MIL-STD-105E: 10 consecutive lots remain on tightened. AAAARAAAAR never gives 5 in a row.
        string pattern = "RR" + "AAAARAAAAR";
        var mil = new SwitchingOptions { Discontinue = DiscontinueRule.TenConsecutiveOnTightened };
        SwitchingState state = SwitchingRules.Evaluate(Lots(pattern), mil);
        Assert.True(state.IsDiscontinued);
        Assert.Equal(11, state.LastEvent!.LotIndex);
        Assert.Contains("10 consecutive", state.Reason, StringComparison.Ordinal);
        SwitchingState iso = SwitchingRules.Evaluate(Lots(pattern));
        Assert.False(iso.IsDiscontinued); // only 2 rejections on tightened
        Assert.Equal(2, iso.RejectedOnTightened);
    }

    [Fact]
    public void Normal_to_reduced_105E_after_10_accepted_within_the_caller_limit()
    {
        // Table VIII is not transcribed: the caller's limit number (here 2 for 800 units, a stand-in).
        var options = new SwitchingOptions { ReducedApproved = true, LimitNumberForTotalSampleSize = units => units == 800 ? 2 : null };
        List<LotOutcome> lots = Lots("AAAAAAAAAA");
        lots[3] = new LotOutcome(true, 1, 80);
        lots[7] = new LotOutcome(true, 1, 80);
        SwitchingState state = SwitchingRules.Evaluate(lots, options);
        Assert.Equal(InspectionSeverity.Reduced, state.Severity);
        Assert.Equal(9, state.LastEvent!.LotIndex);
        Assert.Contains("2 defectives in 800 units", state.Reason, StringComparison.Ordinal);

        lots[5] = new LotOutcome(true, 1, 80); // 3 defectives: above the limit
        Assert.Equal(InspectionSeverity.Normal, SwitchingRules.Evaluate(lots, options).Severity);
    }

    [Fact]
    public void Normal_to_reduced_needs_approval_a_limit_steady_production_and_10_lots_since_normal_began()
    {
        var approved = new SwitchingOptions { ReducedApproved = true, LimitNumberForTotalSampleSize = _ => 5 };
        Assert.Equal(InspectionSeverity.Normal, SwitchingRules.Evaluate(Lots("AAAAAAAAAA"), approved with { ReducedApproved = false }).Severity);
        Assert.Equal(InspectionSeverity.Normal, SwitchingRules.Evaluate(Lots("AAAAAAAAAA"), approved with { LimitNumberForTotalSampleSize = null }).Severity);
        Assert.Equal(InspectionSeverity.Normal, SwitchingRules.Evaluate(Lots("AAAUAAAAAA"), approved).Severity);
        Assert.Equal(InspectionSeverity.Normal, SwitchingRules.Evaluate(Lots("AAAAAAAAA"), approved).Severity);
        // Back from tightened at lot 6: the 10 lots count from then, so lot 16 switches, not lot 15.
        SwitchingState state = SwitchingRules.Evaluate(Lots("RRAAAAA" + "AAAAAAAAAA"), approved);
        Assert.Equal(InspectionSeverity.Reduced, state.Severity);
        Assert.Equal(16, state.LastEvent!.LotIndex);
    }

    [Theory]
    [InlineData("R", "rejected")]
    [InlineData("G", "between Ac and Re")]
    [InlineData("U", "irregular")]
    public void Reduced_to_normal_on_rejection_gap_or_irregular_production(string lot, string reason)
    {
        var options = new SwitchingOptions { InitialSeverity = InspectionSeverity.Reduced };
        SwitchingState state = SwitchingRules.Evaluate(Lots("AAA" + lot, sampleSize: 32), options);
        Assert.Equal(InspectionSeverity.Normal, state.Severity);
        Assert.Equal(3, state.LastEvent!.LotIndex);
        Assert.Contains(reason, state.Reason, StringComparison.Ordinal);
    }

    [Fact]
    public void Iso_switching_score_plus_2_per_accepted_lot_when_Ac_is_at_most_1()
    {
        // ISO 2859-1:1999: score >= 30 switches (score rules from memory): 15 lots x 2 = 30.
        var options = new SwitchingOptions { Variant = SwitchingVariant.Iso2859Part1Of1999, ReducedApproved = true };
        SwitchingState fourteen = SwitchingRules.Evaluate(Lots(new string('A', 14), ac: 1), options);
        Assert.Equal(InspectionSeverity.Normal, fourteen.Severity);
        Assert.Equal(28, fourteen.SwitchingScore);
        SwitchingState fifteen = SwitchingRules.Evaluate(Lots(new string('A', 15), ac: 1), options);
        Assert.Equal(InspectionSeverity.Reduced, fifteen.Severity);
        Assert.Equal(14, fifteen.LastEvent!.LotIndex);
        // A rejection resets the score (from memory).
        Assert.Equal(InspectionSeverity.Normal, SwitchingRules.Evaluate(Lots("AAAAAAAAR" + "AAAAAA", ac: 1), options).Severity);
    }

    [Fact]
    public void Iso_switching_score_plus_3_when_Ac_at_least_2_and_passing_one_step_tighter()
    {
        // ISO 2859-1:1999 (score rules from memory): 10 lots x 3 = 30; a lot that would fail at the
        // next tighter AQL resets the score to 0.
        var options = new SwitchingOptions { Variant = SwitchingVariant.Iso2859Part1Of1999, ReducedApproved = true };
        var lots = Enumerable.Range(0, 10).Select(_ => new LotOutcome(true, 1, 80) { AcceptanceNumber = 2, PassesAtNextTighterAql = true }).ToList();
        Assert.Equal(InspectionSeverity.Reduced, SwitchingRules.Evaluate(lots, options).Severity);
        lots[4] = new LotOutcome(true, 2, 80) { AcceptanceNumber = 2, PassesAtNextTighterAql = false };
        SwitchingState state = SwitchingRules.Evaluate(lots, options);
        Assert.Equal(InspectionSeverity.Normal, state.Severity);
        Assert.Equal(15, state.SwitchingScore); // lots 5..9
    }

    [Fact]
    public void Iso_variant_names_the_lot_missing_what_the_score_needs()
    {
        var options = new SwitchingOptions { Variant = SwitchingVariant.Iso2859Part1Of1999 };
        var error = Assert.Throws<ArgumentException>(() => SwitchingRules.Evaluate([new LotOutcome(true, 0, 80) { AcceptanceNumber = 1 }, new LotOutcome(true, 0, 80)], options));
        Assert.Contains("lot 1", error.Message, StringComparison.Ordinal);
        error = Assert.Throws<ArgumentException>(() => SwitchingRules.Evaluate([new LotOutcome(true, 0, 80) { AcceptanceNumber = 3 }], options));
        Assert.Contains("PassesAtNextTighterAql", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void FromPlan_marks_the_reduced_gap()
    {
        // Table II-C J at 1.0: n = 32, 1/3 (Re from memory): 2 defectives accept and return to normal.
        SamplingPlan reduced = SamplingPlanner.Mil105E(1000, InspectionLevel.II, InspectionSeverity.Reduced, 1.0);
        LotOutcome gap = LotOutcome.FromPlan(reduced, 2);
        Assert.True(gap.Accepted);
        Assert.True(gap.BetweenAcAndRe);
        Assert.False(LotOutcome.FromPlan(reduced, 3).Accepted);
        Assert.Throws<ArgumentException>(() => new LotOutcome(false, 3, 32) { BetweenAcAndRe = true });
    }
}
