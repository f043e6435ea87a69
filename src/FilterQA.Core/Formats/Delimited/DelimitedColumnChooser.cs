using System.Globalization;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Formats.Delimited;

/// <summary>
/// Decides which columns are frequency, level and phase, from the caller's choice, the header
/// words, or the position (no header). Problems are reported through <see cref="DelimitedProblem"/>.
/// </summary>
internal static class DelimitedColumnChooser
{
    /// <summary>Chooses for a file with a header row.</summary>
    public static DelimitedColumnPlan FromHeader(string[] header, int headerLine, DelimitedTextOptions options)
    {
        int frequency, level;
        int? phase;
        ScalarQuantity? headerQuantity;
        if (options.Columns is { } picked)
        {
            RequireColumns(picked, header.Length, headerLine);
            frequency = picked.FrequencyColumn - 1;
            level = picked.LevelColumn - 1;
            phase = picked.PhaseColumn - 1;
            headerQuantity = QuantityOfLevel(header, level, headerLine);
        }
        else
        {
            frequency = Array.FindIndex(header, DelimitedHeaderWords.IsFrequency);
            if (frequency < 0)
            {
                throw new DelimitedProblem(headerLine, 0,
                    "the header has no frequency column; expected a cell naming it, e.g. \"Frequency (MHz)\", \"Freq [kHz]\" or \"f/GHz\" (or pick the columns in the options)");
            }
            level = ChooseLevel(header, frequency, headerLine, options.Quantity);
            headerQuantity = QuantityOfLevel(header, level, headerLine);
            phase = ChoosePhase(header, frequency, level);
        }
        if (phase is { } p && DelimitedHeaderWords.IsRadians(header[p]))
        {
            throw new DelimitedProblem(headerLine, p + 1, Quote(header[p]) + " is a phase in radians; expected degrees");
        }

        if (!DelimitedHeaderWords.TryFrequencyUnitOf(header[frequency], out FrequencyUnit? headerUnit, out string unknown))
        {
            throw new DelimitedProblem(headerLine, frequency + 1,
                $"unknown frequency unit {Quote(unknown)} in header {Quote(header[frequency])}; expected Hz, kHz, MHz or GHz");
        }
        if (headerUnit is { } hu && options.Unit is { } ou && hu != ou)
        {
            throw new DelimitedProblem(headerLine, frequency + 1,
                $"the header says the frequency is in {hu.Symbol()} but the options say {ou.Symbol()}");
        }
        if (headerQuantity is { } hq && options.Quantity is { } oq && hq != oq)
        {
            throw new DelimitedProblem(headerLine, level + 1,
                $"the header says the level is {Describe(hq)} but the options say {Describe(oq)}");
        }
        return new DelimitedColumnPlan(frequency, level, phase,
            headerUnit ?? options.Unit ?? FrequencyUnit.Hz,
            headerQuantity ?? options.Quantity ?? ScalarQuantity.GainDb);
    }

    /// <summary>Chooses for a file without a header: the caller's columns, or frequency, level, optional phase.</summary>
    public static DelimitedColumnPlan Positional(int cellCount, int firstLine, DelimitedTextOptions options)
    {
        FrequencyUnit unit = options.Unit ?? FrequencyUnit.Hz;
        ScalarQuantity quantity = options.Quantity ?? ScalarQuantity.GainDb;
        if (options.Columns is { } picked)
        {
            RequireColumns(picked, cellCount, firstLine);
            return new DelimitedColumnPlan(picked.FrequencyColumn - 1, picked.LevelColumn - 1, picked.PhaseColumn - 1, unit, quantity);
        }
        if (cellCount > 3)
        {
            throw new DelimitedProblem(firstLine, 0, string.Create(CultureInfo.InvariantCulture,
                $"the rows have {cellCount} cells and there is no header to name them; expected frequency, level and optional phase, a header, or columns picked in the options"));
        }
        return new DelimitedColumnPlan(0, 1, cellCount == 3 ? 2 : null, unit, quantity);
    }

    private static int ChooseLevel(string[] header, int frequency, int headerLine, ScalarQuantity? wanted)
    {
        var db = new List<int>();
        var dbm = new List<int>();
        var unclaimed = new List<int>();
        for (int i = 0; i < header.Length; i++)
        {
            if (i == frequency || DelimitedHeaderWords.IsPhase(header[i]))
            {
                continue;
            }
            switch (DelimitedHeaderWords.LevelUnitOf(header[i], out _))
            {
                case DelimitedLevelUnit.Db: db.Add(i); break;
                case DelimitedLevelUnit.Dbm: dbm.Add(i); break;
                case DelimitedLevelUnit.None: unclaimed.Add(i); break;
                case DelimitedLevelUnit.Other: break;
            }
        }
        if (db.Count > 0 && dbm.Count > 0)
        {
            if (wanted is null)
            {
                throw new DelimitedProblem(headerLine, 0,
                    $"the header has both a dB column ({Quote(header[db[0]])}) and a dBm column ({Quote(header[dbm[0]])}); expected the quantity or the columns to be chosen in the options");
            }
            return PreferS21(header, wanted == ScalarQuantity.PowerDbm ? dbm : db);
        }
        if (dbm.Count > 0)
        {
            return PreferS21(header, dbm);
        }
        if (db.Count > 0)
        {
            return PreferS21(header, db);
        }
        // No dB word: in a short file the column after the frequency is the level, as without a header.
        if (header.Length <= 3 && unclaimed.Count > 0)
        {
            return unclaimed[0];
        }
        int other = Array.FindIndex(header, h => DelimitedHeaderWords.LevelUnitOf(h, out _) == DelimitedLevelUnit.Other);
        throw new DelimitedProblem(headerLine, other >= 0 ? other + 1 : 0, other >= 0
            ? $"the level unit in {Quote(header[other])} is not supported; expected dB (a gain) or dBm (a power)"
            : "the header has no level column; expected a cell with \"dB\" (a gain, e.g. \"S21 dB\") or \"dBm\" (a power)");
    }

    private static int? ChoosePhase(string[] header, int frequency, int level)
    {
        string? path = DelimitedHeaderWords.SParameterOf(header[level]);
        int neutral = -1;
        for (int i = 0; i < header.Length; i++)
        {
            if (i == frequency || i == level || !DelimitedHeaderWords.IsPhase(header[i]))
            {
                continue;
            }
            string? phasePath = DelimitedHeaderWords.SParameterOf(header[i]);
            if (path is not null && phasePath == path)
            {
                return i;
            }
            // A phase naming another S-parameter than the level belongs to another path: never taken.
            if ((phasePath is null || path is null) && neutral < 0)
            {
                neutral = i;
            }
        }
        return neutral >= 0 ? neutral : null;
    }

    private static ScalarQuantity? QuantityOfLevel(string[] header, int level, int headerLine)
    {
        string cell = header[level];
        switch (DelimitedHeaderWords.LevelUnitOf(cell, out string unit))
        {
            case DelimitedLevelUnit.Db:
                return ScalarQuantity.GainDb;
            case DelimitedLevelUnit.Dbm:
                return ScalarQuantity.PowerDbm;
            case DelimitedLevelUnit.Other:
                throw new DelimitedProblem(headerLine, level + 1,
                    $"the level unit {Quote(unit)} in {Quote(cell)} is not supported; expected dB (a gain) or dBm (a power)");
            default:
                if (DelimitedHeaderWords.LooksLinear(cell))
                {
                    throw new DelimitedProblem(headerLine, level + 1,
                        $"the level column {Quote(cell)} looks like a linear magnitude or a real/imaginary part; expected dB or dBm");
                }
                return null;
        }
    }

    private static int PreferS21(string[] header, List<int> candidates)
    {
        foreach (int i in candidates)
        {
            if (DelimitedHeaderWords.SParameterOf(header[i]) == "s21")
            {
                return i;
            }
        }
        return candidates[0];
    }

    private static void RequireColumns(DelimitedColumns picked, int cellCount, int line)
    {
        if (picked.HighestColumn > cellCount)
        {
            throw new DelimitedProblem(line, 0, string.Create(CultureInfo.InvariantCulture,
                $"the options pick column {picked.HighestColumn} but the rows have {cellCount} cells"));
        }
    }

    private static string Describe(ScalarQuantity quantity) => quantity == ScalarQuantity.PowerDbm ? "a power in dBm" : "a gain in dB";

    internal static string Quote(string text) => "\"" + (text.Length > 40 ? string.Concat(text.AsSpan(0, 40), "...") : text) + "\"";
}
