namespace FilterQA.Core.Statistics;

/// <summary>Yield of a lot. Yields are fractions 0..1; NaN when no unit was tested.</summary>
/// <param name="UnitsTested">Units with at least one measurement.</param>
/// <param name="FirstPassGo">Units that were go on their first measurement.</param>
/// <param name="FinalGo">Units that were go on their final measurement under the retest policy.</param>
/// <param name="UnitsRetested">Units measured more than once (within the policy).</param>
/// <param name="UnitsBeyondPolicy">Units with more measurements than the policy allows (the extra ones were ignored).</param>
/// <param name="Policy">The retest policy applied.</param>
public sealed record LotYield(int UnitsTested, int FirstPassGo, int FinalGo, int UnitsRetested, int UnitsBeyondPolicy, RetestPolicy Policy)
{
    /// <summary>First-pass yield FirstPassGo / UnitsTested, 0..1; NaN for no units.</summary>
    public double FirstPassYield => UnitsTested == 0 ? double.NaN : (double)FirstPassGo / UnitsTested;

    /// <summary>Final yield FinalGo / UnitsTested, 0..1; NaN for no units.</summary>
    public double FinalYield => UnitsTested == 0 ? double.NaN : (double)FinalGo / UnitsTested;

    /// <summary>Units no-go on their final measurement.</summary>
    public int FinalNoGo => UnitsTested - FinalGo;
}
