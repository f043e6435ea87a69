using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Formats.Delimited;

/// <summary>Which cells of a row hold what, 0-based, and the units they are in.</summary>
internal sealed record DelimitedColumnPlan(int FrequencyIndex, int LevelIndex, int? PhaseIndex, FrequencyUnit Unit, ScalarQuantity Quantity)
{
    /// <summary>The highest cell index used.</summary>
    public int HighestIndex => Math.Max(Math.Max(FrequencyIndex, LevelIndex), PhaseIndex ?? 0);
}
