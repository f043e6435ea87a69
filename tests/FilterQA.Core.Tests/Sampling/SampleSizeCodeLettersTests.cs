using FilterQA.Core.Sampling;

namespace FilterQA.Core.Tests.Sampling;

public sealed class SampleSizeCodeLettersTests
{
    // MIL-STD-105E Table I (same as ANSI/ASQ Z1.4 and ISO 2859-1 Table 1), every cell: lot-size band
    // (lowest and highest lot size) and the letters for S-1, S-2, S-3, S-4, I, II, III.
    public static TheoryData<int, int, string> TableI => new()
    {
        { 2, 8, "A A A A A A B" },
        { 9, 15, "A A A A A B C" },
        { 16, 25, "A A B B B C D" },
        { 26, 50, "A B B C C D E" },
        { 51, 90, "B B C C C E F" },
        { 91, 150, "B B C D D F G" },
        { 151, 280, "B C D E E G H" },
        { 281, 500, "B C D E F H J" },
        { 501, 1200, "C C E F G J K" },
        { 1201, 3200, "C D E G H K L" },
        { 3201, 10000, "C D F G J L M" },
        { 10001, 35000, "C D F H K M N" },
        { 35001, 150000, "D E G J L N P" },
        { 150001, 500000, "D E G J M P Q" },
        { 500001, int.MaxValue, "D E H K N Q R" },
    };

    [Theory]
    [MemberData(nameof(TableI))]
    public void For_every_band_and_level_matches_MIL_STD_105E_Table_I(int lowestLot, int highestLot, string letters)
    {
        string[] expected = letters.Split(' ');
        InspectionLevel[] levels = [InspectionLevel.S1, InspectionLevel.S2, InspectionLevel.S3, InspectionLevel.S4, InspectionLevel.I, InspectionLevel.II, InspectionLevel.III];
        for (int i = 0; i < levels.Length; i++)
        {
            // Both ends of the band, so a band boundary off by one fails.
            Assert.Equal(expected[i], SampleSizeCodeLetters.For(lowestLot, levels[i]).ToString());
            Assert.Equal(expected[i], SampleSizeCodeLetters.For(highestLot, levels[i]).ToString());
        }
    }

    [Fact]
    public void BandLowerLotSizes_are_the_Table_I_band_starts()
    {
        // MIL-STD-105E Table I band starts.
        Assert.Equal([2, 9, 16, 26, 51, 91, 151, 281, 501, 1201, 3201, 10001, 35001, 150001, 500001], SampleSizeCodeLetters.BandLowerLotSizes);
    }

    [Theory]
    [InlineData(1)]
    [InlineData(0)]
    [InlineData(-5)]
    public void For_lot_below_2_is_rejected(int lotSize)
    {
        var error = Assert.Throws<ArgumentOutOfRangeException>(() => SampleSizeCodeLetters.For(lotSize, InspectionLevel.II));
        Assert.Equal("lotSize", error.ParamName);
    }

    [Fact]
    public void For_undefined_level_is_rejected()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => SampleSizeCodeLetters.For(100, (InspectionLevel)42));
    }
}
