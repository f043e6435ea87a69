namespace FilterQA.Core.Statistics;

/// <summary>First-pass and final yield of a lot from each unit's go/no-go results.</summary>
public static class YieldCalculator
{
    /// <summary>Computes the yield.</summary>
    /// <param name="measurementsPerUnit">One entry per unit: its go (true) / no-go (false) results in the order measured.</param>
    /// <param name="policy">Retest policy; null for <see cref="RetestPolicy.None"/>.</param>
    /// <exception cref="ArgumentException">A unit with no measurements or a null entry; the message names its index.</exception>
    public static LotYield Compute(IEnumerable<IReadOnlyList<bool>> measurementsPerUnit, RetestPolicy? policy = null)
    {
        ArgumentNullException.ThrowIfNull(measurementsPerUnit);
        policy ??= RetestPolicy.None;
        int tested = 0, firstGo = 0, finalGo = 0, retested = 0, beyond = 0;
        foreach (IReadOnlyList<bool>? unit in measurementsPerUnit)
        {
            if (unit is null || unit.Count == 0)
            {
                throw new ArgumentException(FormattableString.Invariant(
                    $"unit at index {tested} has no measurements; leave untested units out"), nameof(measurementsPerUnit));
            }
            int counted = Math.Min(unit.Count, policy.MaxMeasurements);
            tested++;
            firstGo += unit[0] ? 1 : 0;
            finalGo += unit[counted - 1] ? 1 : 0;
            retested += counted > 1 ? 1 : 0;
            beyond += unit.Count > policy.MaxMeasurements ? 1 : 0;
        }
        return new LotYield(tested, firstGo, finalGo, retested, beyond, policy);
    }
}
