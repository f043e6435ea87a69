namespace FilterQA.Core.Decisions;

/// <summary>
/// One side of a rule as measured: the value (null when it could not be measured, with the reason), the tolerance
/// limit and its sense, where it was found, and whether the value is only a lower bound (a reading at the noise floor).
/// </summary>
internal readonly record struct Reading(double? Value, double Limit, LimitSense Sense, double? AtHz, bool IsLowerBound, string Text)
{
    /// <summary>Signed margin: positive inside the limit; null when not measured.</summary>
    public double? Margin => Value is { } v ? (Sense == LimitSense.AtMost ? Limit - v : v - Limit) : null;

    public static Reading Missing(double limit, LimitSense sense, string why) => new(null, limit, sense, null, false, why);
}
