using FilterQA.Reports.Charts;

namespace FilterQA.Reports.Tests.Documents;

public sealed class QrCodeTests
{
    // ISO/IEC 18004:2015 §5.3: a version-V symbol is 17 + 4V modules square, with a 7x7 finder pattern in three corners
    // (dark ring, light ring, dark 3x3 centre) and a quiet zone of 4 light modules on every side (§5.3.8).
    [Theory]
    [InlineData("https://filterqa.tarnwell.example/verify?number=TME-COC-2026-00042&digest=3b8f0c2d9e4a17b65c0d3e2f1a4b5c6d7e8f90123456789abcdef0123456789a")]
    [InlineData("TME-COC-1")]
    public void The_matrix_has_the_standard_structure_and_quiet_zone(string text)
    {
        bool[,] m = QrCodeDrawing.Modules(text);
        int size = m.GetLength(0);
        Assert.Equal(size, m.GetLength(1));
        int symbol = size - 2 * QrCodeDrawing.QuietZoneModules;
        Assert.Equal(0, (symbol - 17) % 4);
        Assert.InRange((symbol - 17) / 4, 1, 40);
        int q = QrCodeDrawing.QuietZoneModules;
        for (int i = 0; i < size; i++)
        {
            for (int k = 0; k < q; k++)
            {
                Assert.False(m[k, i]);
                Assert.False(m[size - 1 - k, i]);
                Assert.False(m[i, k]);
                Assert.False(m[i, size - 1 - k]);
            }
        }
        foreach ((int row, int column) in new[] { (q, q), (q, q + symbol - 7), (q + symbol - 7, q) })
        {
            for (int r = 0; r < 7; r++)
            {
                for (int c = 0; c < 7; c++)
                {
                    bool ring = r == 0 || r == 6 || c == 0 || c == 6;
                    bool centre = r >= 2 && r <= 4 && c >= 2 && c <= 4;
                    Assert.Equal(ring || centre, m[row + r, column + c]);
                }
            }
        }
    }
}
