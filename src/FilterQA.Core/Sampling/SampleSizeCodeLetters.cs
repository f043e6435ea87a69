using System.Globalization;

namespace FilterQA.Core.Sampling;

/// <summary>
/// MIL-STD-105E Table I, sample-size code letters by lot size and inspection level (the same table
/// appears in ANSI/ASQ Z1.4 and ISO 2859-1).
/// </summary>
public static class SampleSizeCodeLetters
{
    // Upper end of each lot-size band; the last band is open (500 001 and above).
    private static readonly int[] BandUpperLotSize = [8, 15, 25, 50, 90, 150, 280, 500, 1200, 3200, 10000, 35000, 150000, 500000, int.MaxValue];

    // One string per band, letters for S-1, S-2, S-3, S-4, I, II, III in that order.
    private static readonly string[] BandLetters =
    [
        "AAAAAAB", // 2-8
        "AAAAABC", // 9-15
        "AABBBCD", // 16-25
        "ABBCCDE", // 26-50
        "BBCCCEF", // 51-90
        "BBCDDFG", // 91-150
        "BCDEEGH", // 151-280
        "BCDEFHJ", // 281-500
        "CCEFGJK", // 501-1200
        "CDEGHKL", // 1201-3200
        "CDFGJLM", // 3201-10000
        "CDFHKMN", // 10001-35000
        "DEGJLNP", // 35001-150000
        "DEGJMPQ", // 150001-500000
        "DEHKNQR", // 500001 and over
    ];

    /// <summary>Lower end of each lot-size band of Table I (2, 9, 16, ... 500 001), in order.</summary>
    public static IReadOnlyList<int> BandLowerLotSizes { get; } = [2, 9, 16, 26, 51, 91, 151, 281, 501, 1201, 3201, 10001, 35001, 150001, 500001];

    /// <summary>The code letter for a lot of <paramref name="lotSize"/> units at <paramref name="level"/>.</summary>
    /// <param name="lotSize">Units in the lot; at least 2 (Table I starts at 2).</param>
    /// <param name="level">Inspection level.</param>
    /// <exception cref="ArgumentOutOfRangeException">Lot size below 2, or a level that is not defined.</exception>
    public static CodeLetter For(int lotSize, InspectionLevel level)
    {
        if (lotSize < 2)
        {
            throw new ArgumentOutOfRangeException(nameof(lotSize), lotSize,
                "MIL-STD-105E Table I starts at a lot size of 2 units; a lot of 1 unit is simply inspected");
        }
        if (!Enum.IsDefined(level))
        {
            throw new ArgumentOutOfRangeException(nameof(level), level, "not a defined inspection level");
        }
        int band = 0;
        while (lotSize > BandUpperLotSize[band])
        {
            band++;
        }
        char letter = BandLetters[band][(int)level];
        return Enum.Parse<CodeLetter>(letter.ToString(CultureInfo.InvariantCulture));
    }
}
