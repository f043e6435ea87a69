using FilterQA.Core.Sampling;

namespace FilterQA.Core.Tests.Sampling;

public sealed class SingleSamplingTableTests
{
    private static readonly double[] Aqls = [0.065, 0.10, 0.15, 0.25, 0.40, 0.65, 1.0, 1.5, 2.5, 4.0, 6.5];

    // MIL-STD-105E Table II-A (normal, single sampling), every cell, rows "letter n cells" for AQL
    // 0.065 .. 6.5 %. Transcribed separately from the engine's data, in the table's own layout.
    private const string TableIIA = """
        A 2 ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ 0/1
        B 3 ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ 0/1 ↑
        C 5 ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ 0/1 ↑ ↓
        D 8 ↓ ↓ ↓ ↓ ↓ ↓ ↓ 0/1 ↑ ↓ 1/2
        E 13 ↓ ↓ ↓ ↓ ↓ ↓ 0/1 ↑ ↓ 1/2 2/3
        F 20 ↓ ↓ ↓ ↓ ↓ 0/1 ↑ ↓ 1/2 2/3 3/4
        G 32 ↓ ↓ ↓ ↓ 0/1 ↑ ↓ 1/2 2/3 3/4 5/6
        H 50 ↓ ↓ ↓ 0/1 ↑ ↓ 1/2 2/3 3/4 5/6 7/8
        J 80 ↓ ↓ 0/1 ↑ ↓ 1/2 2/3 3/4 5/6 7/8 10/11
        K 125 ↓ 0/1 ↑ ↓ 1/2 2/3 3/4 5/6 7/8 10/11 14/15
        L 200 0/1 ↑ ↓ 1/2 2/3 3/4 5/6 7/8 10/11 14/15 21/22
        M 315 ↑ ↓ 1/2 2/3 3/4 5/6 7/8 10/11 14/15 21/22 ↑
        N 500 ↓ 1/2 2/3 3/4 5/6 7/8 10/11 14/15 21/22 ↑ ↑
        P 800 1/2 2/3 3/4 5/6 7/8 10/11 14/15 21/22 ↑ ↑ ↑
        Q 1250 2/3 3/4 5/6 7/8 10/11 14/15 21/22 ↑ ↑ ↑ ↑
        R 2000 3/4 5/6 7/8 10/11 14/15 21/22 ↑ ↑ ↑ ↑ ↑
        """;

    // MIL-STD-105E Table II-B (tightened, single sampling), every cell for letters A..R.
    private const string TableIIB = """
        A 2 ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓
        B 3 ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ 0/1
        C 5 ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ 0/1 ↑
        D 8 ↓ ↓ ↓ ↓ ↓ ↓ ↓ ↓ 0/1 ↑ ↓
        E 13 ↓ ↓ ↓ ↓ ↓ ↓ ↓ 0/1 ↑ ↓ 1/2
        F 20 ↓ ↓ ↓ ↓ ↓ ↓ 0/1 ↑ ↓ 1/2 2/3
        G 32 ↓ ↓ ↓ ↓ ↓ 0/1 ↑ ↓ 1/2 2/3 3/4
        H 50 ↓ ↓ ↓ ↓ 0/1 ↑ ↓ 1/2 2/3 3/4 5/6
        J 80 ↓ ↓ ↓ 0/1 ↑ ↓ 1/2 2/3 3/4 5/6 8/9
        K 125 ↓ ↓ 0/1 ↑ ↓ 1/2 2/3 3/4 5/6 8/9 12/13
        L 200 ↓ 0/1 ↑ ↓ 1/2 2/3 3/4 5/6 8/9 12/13 18/19
        M 315 0/1 ↑ ↓ 1/2 2/3 3/4 5/6 8/9 12/13 18/19 ↑
        N 500 ↑ ↓ 1/2 2/3 3/4 5/6 8/9 12/13 18/19 ↑ ↑
        P 800 ↓ 1/2 2/3 3/4 5/6 8/9 12/13 18/19 ↑ ↑ ↑
        Q 1250 1/2 2/3 3/4 5/6 8/9 12/13 18/19 ↑ ↑ ↑ ↑
        R 2000 2/3 3/4 5/6 8/9 12/13 18/19 ↑ ↑ ↑ ↑ ↑
        """;

    public static TheoryData<string> Tables => new() { "II-A", "II-B" };

    [Theory]
    [MemberData(nameof(Tables))]
    public void Every_cell_and_sample_size_matches_the_published_table(string name)
    {
        // Source: MIL-STD-105E Tables II-A and II-B (normal AQL 0.65-6.5 and tightened 0.65-6.5
        // checked against a published table; the 0.065-0.40 arrow positions and rows M-R derived
        // from the table's structure).
        (SingleSamplingTable table, string text) = name == "II-A" ? (SingleSamplingTable.Normal, TableIIA) : (SingleSamplingTable.Tightened, TableIIB);
        foreach (string line in text.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries))
        {
            string[] t = line.Split(' ');
            CodeLetter letter = Enum.Parse<CodeLetter>(t[0]);
            Assert.Equal(int.Parse(t[1], System.Globalization.CultureInfo.InvariantCulture), table.SampleSize(letter));
            for (int c = 0; c < Aqls.Length; c++)
            {
                Assert.True(t[2 + c] == table.Cell(letter, Aqls[c]).ToString(), $"{name} letter {letter} AQL {Aqls[c]}: expected {t[2 + c]}, got {table.Cell(letter, Aqls[c])}");
            }
        }
    }

    // Cross-section of single cells (Ac/Re as printed), table named in each row.
    [Theory]
    [InlineData("II-A", "J", 1.0, "2/3")]
    [InlineData("II-A", "K", 0.40, "1/2")]
    [InlineData("II-A", "L", 6.5, "21/22")]
    [InlineData("II-A", "H", 0.25, "0/1")]
    [InlineData("II-A", "D", 1.0, "↓")]
    [InlineData("II-A", "B", 6.5, "↑")]
    [InlineData("II-B", "J", 6.5, "8/9")]
    [InlineData("II-B", "K", 4.0, "8/9")]
    [InlineData("II-B", "L", 6.5, "18/19")]
    [InlineData("II-B", "A", 6.5, "↓")]
    [InlineData("II-B", "M", 0.065, "0/1")]
    [InlineData("II-C", "J", 0.65, "0/2")] // II-C, from the Table II-C row J example (Ac published, Re from memory)
    [InlineData("II-C", "J", 1.0, "1/3")]
    [InlineData("II-C", "J", 1.5, "1/4")]
    [InlineData("II-C", "J", 2.5, "2/5")]
    [InlineData("II-C", "J", 4.0, "3/6")]
    [InlineData("II-C", "J", 6.5, "5/8")]
    [InlineData("II-C", "J", 0.15, "0/1")]
    public void Cell_matches_the_published_table(string name, string letter, double aql, string expected)
    {
        Assert.Equal(expected, TableByName(name).Cell(Enum.Parse<CodeLetter>(letter), aql).ToString());
    }

    [Fact]
    public void Reduced_sample_sizes_match_Table_II_C()
    {
        // MIL-STD-105E Table II-C sample sizes for letters A..R.
        int[] expected = [2, 2, 2, 3, 5, 8, 13, 20, 32, 50, 80, 125, 200, 315, 500, 800];
        for (int i = 0; i < expected.Length; i++)
        {
            Assert.Equal(expected[i], SingleSamplingTable.Reduced.SampleSize((CodeLetter)i));
        }
    }

    [Fact]
    public void Reduced_table_keeps_the_II_A_arrows_and_maps_each_plan_to_its_reduced_plan()
    {
        // Table II-C: arrows in the same cells as II-A (derived from the table's structure); along a
        // row the plans after 0/1 run 0/2, 1/3, 1/4, 2/5, 3/6, 5/8, 7/10, 10/13 (Ac published, Re from memory),
        // in the places of II-A's 1/2, 2/3, 3/4, 5/6, 7/8, 10/11, 14/15, 21/22.
        var map = new Dictionary<string, string>
        {
            ["0/1"] = "0/1", ["1/2"] = "0/2", ["2/3"] = "1/3", ["3/4"] = "1/4", ["5/6"] = "2/5",
            ["7/8"] = "3/6", ["10/11"] = "5/8", ["14/15"] = "7/10", ["21/22"] = "10/13",
        };
        for (CodeLetter letter = CodeLetter.A; letter <= CodeLetter.R; letter++)
        {
            foreach (double aql in Aqls)
            {
                SamplingCell normal = SingleSamplingTable.Normal.Cell(letter, aql);
                SamplingCell reduced = SingleSamplingTable.Reduced.Cell(letter, aql);
                Assert.Equal(normal.Kind, reduced.Kind);
                if (normal.Kind == SamplingCellKind.Plan)
                {
                    Assert.Equal(map[normal.ToString()], reduced.ToString());
                }
            }
        }
    }

    [Fact]
    public void Tightened_letter_S_has_3150_units_and_no_plan_in_the_columns_held()
    {
        // MIL-STD-105E Table II-B: letter S, n = 3150, has a plan only below AQL 0.065 %.
        Assert.Equal(3150, SingleSamplingTable.Tightened.SampleSize(CodeLetter.S));
        Assert.All(Aqls, aql => Assert.Equal(SamplingCellKind.Blank, SingleSamplingTable.Tightened.Cell(CodeLetter.S, aql).Kind));
        Assert.False(SingleSamplingTable.Normal.HasLetter(CodeLetter.S));
        Assert.Throws<ArgumentOutOfRangeException>(() => SingleSamplingTable.Normal.SampleSize(CodeLetter.S));
        Assert.Throws<InvalidOperationException>(() => SingleSamplingTable.Tightened.Resolve(CodeLetter.S, 1.0));
    }

    // Arrows followed by hand on the published tables: the plan is the first Ac/Re in the arrow's
    // direction, with THAT letter's n.
    [Theory]
    [InlineData("II-A", "D", 1.0, "E", 13, 0, 1)]     // II-A: D at 1.0 is ↓, first plan below is E 0/1
    [InlineData("II-A", "B", 6.5, "A", 2, 0, 1)]      // II-A: ↑ to A 0/1
    [InlineData("II-A", "C", 6.5, "D", 8, 1, 2)]      // II-A: ↓ to D 1/2
    [InlineData("II-A", "A", 0.065, "L", 200, 0, 1)]  // II-A: the whole 0.065 column down to L
    [InlineData("II-A", "M", 0.065, "L", 200, 0, 1)]  // II-A: ↑ to L
    [InlineData("II-A", "N", 0.065, "P", 800, 1, 2)]  // II-A: ↓ to P
    [InlineData("II-A", "G", 0.65, "F", 20, 0, 1)]    // II-A: ↑ to F
    [InlineData("II-A", "R", 6.5, "L", 200, 21, 22)]  // II-A: ↑ through Q, P, N, M to L
    [InlineData("II-A", "R", 1.0, "Q", 1250, 21, 22)] // II-A: ↑ to Q
    [InlineData("II-A", "J", 1.0, "J", 80, 2, 3)]     // II-A: a plan cell stays
    [InlineData("II-B", "A", 6.5, "B", 3, 0, 1)]      // II-B: ↓ to B
    [InlineData("II-B", "A", 0.065, "M", 315, 0, 1)]  // II-B: down the 0.065 column to M
    [InlineData("II-B", "N", 0.065, "M", 315, 0, 1)]  // II-B: ↑ to M
    [InlineData("II-B", "P", 0.065, "Q", 1250, 1, 2)] // II-B: ↓ to Q
    [InlineData("II-B", "D", 4.0, "C", 5, 0, 1)]      // II-B: ↑ to C
    [InlineData("II-B", "M", 6.5, "L", 200, 18, 19)]  // II-B: ↑ to L
    [InlineData("II-C", "D", 1.0, "E", 5, 0, 1)]      // II-C: ↓ to E with the reduced n = 5
    [InlineData("II-C", "M", 6.5, "L", 80, 10, 13)]   // II-C: ↑ to L, n = 80 (Re from memory)
    [InlineData("II-C", "A", 0.065, "L", 80, 0, 1)]   // II-C: down the 0.065 column to L
    public void Resolve_follows_arrows_to_that_letters_n_and_Ac_Re(string name, string letter, double aql, string usedLetter, int n, int ac, int re)
    {
        TablePlan plan = TableByName(name).Resolve(Enum.Parse<CodeLetter>(letter), aql);
        Assert.Equal(Enum.Parse<CodeLetter>(letter), plan.TableLetter);
        Assert.Equal(Enum.Parse<CodeLetter>(usedLetter), plan.LetterUsed);
        Assert.Equal(n, plan.SampleSize);
        Assert.Equal(ac, plan.AcceptanceNumber);
        Assert.Equal(re, plan.RejectionNumber);
    }

    [Theory]
    [InlineData("II-A")]
    [InlineData("II-B")]
    [InlineData("II-C")]
    public void Every_cell_A_to_R_resolves_to_the_first_plan_in_the_arrows_direction(string name)
    {
        // Rule of Tables II-A/B/C: ↓ = first plan below, ↑ = first plan above. Checked by walking the
        // printed cells here, independently of Resolve.
        SingleSamplingTable table = TableByName(name);
        for (CodeLetter letter = CodeLetter.A; letter <= CodeLetter.R; letter++)
        {
            foreach (double aql in Aqls)
            {
                SamplingCell cell = table.Cell(letter, aql);
                int step = cell.Kind == SamplingCellKind.ArrowDown ? 1 : cell.Kind == SamplingCellKind.ArrowUp ? -1 : 0;
                var row = letter;
                while (table.Cell(row, aql).Kind != SamplingCellKind.Plan)
                {
                    row += step;
                }
                TablePlan plan = table.Resolve(letter, aql);
                Assert.Equal(row, plan.LetterUsed);
                Assert.Equal(table.SampleSize(row), plan.SampleSize);
                Assert.Equal(table.Cell(row, aql).AcceptanceNumber, plan.AcceptanceNumber);
            }
        }
    }

    [Theory]
    [InlineData(10.0)]
    [InlineData(0.5)]
    [InlineData(double.NaN)]
    public void Aql_that_is_not_a_column_is_rejected_with_the_allowed_values(double aql)
    {
        var error = Assert.Throws<ArgumentOutOfRangeException>(() => SingleSamplingTable.Normal.Cell(CodeLetter.J, aql));
        Assert.Contains("0.065", error.Message, StringComparison.Ordinal);
    }

    private static SingleSamplingTable TableByName(string name) => name switch
    {
        "II-A" => SingleSamplingTable.Normal,
        "II-B" => SingleSamplingTable.Tightened,
        _ => SingleSamplingTable.Reduced,
    };
}
