using System.Globalization;

namespace FilterQA.Core.Sampling;

/// <summary>
/// The MIL-STD-105E / Z1.4 / ISO 2859-1 switching rules as a pure function over the ordered
/// history of lots (original inspection only) of one part, supplier and defect class.
/// </summary>
/// <remarks>
/// Counts restart at every switch: the "2 of 5 consecutive lots" window and the 10-lot reduced
/// check look only at lots inspected on normal since normal inspection last began (common
/// practice, no published source for the restart). Rules applied after each lot:
/// normal → tightened when this lot and another of the last 5 (this one included) are rejected;
/// tightened → normal after 5 consecutive accepted lots; normal → reduced per
/// <see cref="SwitchingVariant"/>; reduced → normal on a rejected lot, a lot accepted between Ac
/// and Re, or irregular production; discontinue per <see cref="DiscontinueRule"/>.
/// </remarks>
public static class SwitchingRules
{
    /// <summary>Runs the rules over <paramref name="lots"/> in order.</summary>
    /// <param name="lots">Lots in the order inspected; may be empty (the state is then the initial severity).</param>
    /// <param name="options">Settings; null for the defaults of <see cref="SwitchingOptions"/>.</param>
    /// <exception cref="ArgumentException">A null lot, a lot after discontinuation, or (ISO variant) a lot on normal lacking the Ac or the next-tighter-AQL result the score needs; the message names the lot index.</exception>
    public static SwitchingState Evaluate(IReadOnlyList<LotOutcome> lots, SwitchingOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(lots);
        options ??= new SwitchingOptions();
        if (!Enum.IsDefined(options.InitialSeverity))
        {
            throw new ArgumentOutOfRangeException(nameof(options), options.InitialSeverity, "initial severity is not defined");
        }

        var events = new List<SwitchingEvent>();
        var severityByLot = new InspectionSeverity[lots.Count];
        var normalLots = new List<LotOutcome>();
        InspectionSeverity severity = options.InitialSeverity;
        bool discontinued = false;
        int run = 0, score = 0, rejectedOnTightened = 0, lotsOnTightened = 0;

        void SwitchTo(int index, InspectionSeverity to, string reason)
        {
            events.Add(new SwitchingEvent(index, severity, to, false, reason));
            severity = to;
            run = 0;
            score = 0;
            rejectedOnTightened = 0;
            lotsOnTightened = 0;
            normalLots.Clear();
        }

        for (int i = 0; i < lots.Count; i++)
        {
            LotOutcome lot = lots[i] ?? throw new ArgumentException(Invariant($"lot {i} of the history is null"), nameof(lots));
            if (discontinued)
            {
                throw new ArgumentException(Invariant(
                    $"lot {i} follows the discontinuation at lot {events[^1].LotIndex}; after corrective action start a new history with initial severity Tightened"),
                    nameof(lots));
            }
            severityByLot[i] = severity;
            run = lot.Accepted ? run + 1 : 0;
            switch (severity)
            {
                case InspectionSeverity.Normal:
                    normalLots.Add(lot);
                    if (options.Variant == SwitchingVariant.Iso2859Part1Of1999)
                    {
                        score = NextScore(score, lot, i);
                    }
                    if (!lot.Accepted && TryTwoOfFive(normalLots, out int window))
                    {
                        SwitchTo(i, InspectionSeverity.Tightened, Invariant(
                            $"normal → tightened: 2 lots rejected within {window} consecutive lots (lot {i} the second)"));
                    }
                    else if (ReducedReason(normalLots, lot, score, options) is { } reducedReason)
                    {
                        SwitchTo(i, InspectionSeverity.Reduced, reducedReason);
                    }
                    break;

                case InspectionSeverity.Tightened:
                    lotsOnTightened++;
                    if (!lot.Accepted)
                    {
                        rejectedOnTightened++;
                    }
                    if (run >= 5)
                    {
                        SwitchTo(i, InspectionSeverity.Normal, Invariant($"tightened → normal: 5 consecutive lots accepted (lots {i - 4} to {i})"));
                    }
                    else if (options.Discontinue == DiscontinueRule.FiveRejectedOnTightened && rejectedOnTightened >= 5)
                    {
                        discontinued = true;
                        events.Add(new SwitchingEvent(i, severity, severity, true, Invariant(
                            $"discontinued: 5 lots rejected while on tightened inspection (lot {i} the fifth; Z1.4 / ISO 2859-1 rule)")));
                    }
                    else if (options.Discontinue == DiscontinueRule.TenConsecutiveOnTightened && lotsOnTightened >= 10)
                    {
                        discontinued = true;
                        events.Add(new SwitchingEvent(i, severity, severity, true, Invariant(
                            $"discontinued: 10 consecutive lots remained on tightened inspection (lot {i} the tenth; MIL-STD-105E rule)")));
                    }
                    break;

                default:
                    string? back = !lot.Accepted ? Invariant($"reduced → normal: lot {i} rejected")
                        : lot.BetweenAcAndRe ? Invariant($"reduced → normal: lot {i} accepted with defectives between Ac and Re")
                        : !lot.ProductionSteady ? Invariant($"reduced → normal: production irregular or delayed at lot {i}")
                        : null;
                    if (back is not null)
                    {
                        SwitchTo(i, InspectionSeverity.Normal, back);
                    }
                    break;
            }
        }

        return new SwitchingState(severity, discontinued, events, severityByLot, run,
            severity == InspectionSeverity.Normal ? score : 0,
            severity == InspectionSeverity.Tightened ? rejectedOnTightened : 0,
            severity == InspectionSeverity.Tightened ? lotsOnTightened : 0);
    }

    // The newest normal lot is rejected; is another rejection among the 4 normal lots before it?
    private static bool TryTwoOfFive(List<LotOutcome> normalLots, out int window)
    {
        int last = normalLots.Count - 1;
        for (int back = 1; back <= 4 && last - back >= 0; back++)
        {
            if (!normalLots[last - back].Accepted)
            {
                window = back + 1;
                return true;
            }
        }
        window = 0;
        return false;
    }

    private static string? ReducedReason(List<LotOutcome> normalLots, LotOutcome lot, int score, SwitchingOptions options)
    {
        if (!options.ReducedApproved || !lot.ProductionSteady)
        {
            return null;
        }
        if (options.Variant == SwitchingVariant.Iso2859Part1Of1999)
        {
            return score >= SwitchingOptions.IsoSwitchingScoreLimit
                ? Invariant($"normal → reduced (ISO 2859-1:1999): switching score {score} ≥ {SwitchingOptions.IsoSwitchingScoreLimit}, production steady, approved")
                : null;
        }
        if (normalLots.Count < 10 || options.LimitNumberForTotalSampleSize is null)
        {
            return null;
        }
        int defectives = 0, units = 0;
        for (int k = normalLots.Count - 10; k < normalLots.Count; k++)
        {
            LotOutcome previous = normalLots[k];
            if (!previous.Accepted || !previous.ProductionSteady)
            {
                return null;
            }
            defectives += previous.Defectives;
            units += previous.SampleSize;
        }
        int? limit = options.LimitNumberForTotalSampleSize(units);
        return limit is { } l && defectives <= l
            ? Invariant($"normal → reduced (MIL-STD-105E): 10 consecutive lots accepted, {defectives} defectives in {units} units within the limit number {l}, production steady, approved")
            : null;
    }

    // ISO 2859-1:1999 switching score (rules from memory): Ac >= 2: +3 when the lot would also
    // pass at the next tighter AQL, else reset; Ac <= 1: +2 when accepted, else reset.
    private static int NextScore(int score, LotOutcome lot, int index)
    {
        if (lot.AcceptanceNumber is not { } ac)
        {
            throw new ArgumentException(Invariant($"lot {index}: the ISO 2859-1 switching score needs the plan's acceptance number (AcceptanceNumber)"), "lots");
        }
        if (!lot.Accepted)
        {
            return 0;
        }
        if (ac <= 1)
        {
            return score + 2;
        }
        if (lot.PassesAtNextTighterAql is not { } tighter)
        {
            throw new ArgumentException(Invariant($"lot {index}: Ac = {ac} ≥ 2, so the ISO 2859-1 switching score needs PassesAtNextTighterAql"), "lots");
        }
        return tighter ? score + 3 : 0;
    }

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
