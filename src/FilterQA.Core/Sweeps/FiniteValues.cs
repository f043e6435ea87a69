using System.Globalization;

namespace FilterQA.Core.Sweeps;

/// <summary>The one check every per-point array of the model passes: one value per frequency, every value finite.</summary>
internal static class FiniteValues
{
    /// <exception cref="ArgumentException">The length differs from the grid, or a value is NaN or infinite; the message names the index.</exception>
    public static void Check(FrequencyGrid grid, double[] values, string what)
    {
        if (values.Length != grid.Count)
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                $"{what} has {values.Length} values for {grid.Count} frequencies"));
        }
        for (int i = 0; i < values.Length; i++)
        {
            if (!double.IsFinite(values[i]))
            {
                throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                    $"{what} at index {i} is {values[i]}; values must be finite"));
            }
        }
    }
}
