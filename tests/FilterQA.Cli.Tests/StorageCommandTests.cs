using System.Text.Json;
using FilterQA.Core.Decisions;
using FilterQA.Core.Synthesis;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;
using FilterQA.Core.Templates.Text;
using FilterQA.Data.Services;
using Microsoft.Data.Sqlite;

namespace FilterQA.Cli.Tests;

/// <summary>
/// import, lot, reevaluate and backup on a temp SQLite data folder: what they print, what they store, their exit codes.
/// Verdicts of the demo units are not asserted from the synthesiser; a command's stored result is compared with what
/// the database holds, and the what-if's flips with a limit applied by hand to the stored measured values.
/// </summary>
public sealed class StorageCommandTests
{
    [Fact]
    public async Task Import_stores_every_readable_file_reports_the_bad_one_and_exits_1()
    {
        using var f = new StorageCommandFixture();
        f.Unit(1);
        f.Unit(2);
        File.WriteAllText(Path.Combine(f.Sweeps, "S0003.s2p"), "# Hz S RI R 50\nnot a number\n");

        var (code, output, _) = CliFixture.Run(f.Data("import", f.Sweeps, "--lot", StorageCommandFixture.LotNumber, "--station", StorageCommandFixture.Station, "--operator", "R. Haldane"));

        Assert.Equal(1, code);
        Assert.Contains("S0001.s2p: S0001: ", output, StringComparison.Ordinal);
        Assert.Contains("S0002.s2p: S0002: ", output, StringComparison.Ordinal);
        Assert.Contains("S0003.s2p: error: ", output, StringComparison.Ordinal);
        Assert.Contains("3 files: 2 stored, 0 already stored, 1 failed", output, StringComparison.Ordinal);
        using var storage = f.Open();
        LotSummary lot = await storage.Lots.GetSummaryAsync(StorageCommandFixture.LotNumber);
        Assert.Equal((2, 2), (lot.UnitsTested, lot.Measurements));
    }

    [Fact]
    public async Task Import_of_the_same_files_again_stores_nothing_new_and_exits_0()
    {
        using var f = new StorageCommandFixture();
        f.Unit(1);
        string[] args = f.Data("import", f.Sweeps, "--lot", StorageCommandFixture.LotNumber, "--station", StorageCommandFixture.Station, "--operator", "R. Haldane");

        Assert.Equal(0, CliFixture.Run(args).Code);
        var (code, output, _) = CliFixture.Run(args);

        Assert.Equal(0, code);
        Assert.Contains("already stored", output, StringComparison.Ordinal);
        using var storage = f.Open();
        Assert.Equal(1, (await storage.Lots.GetSummaryAsync(StorageCommandFixture.LotNumber)).Measurements);
    }

    [Fact]
    public void Import_from_a_zip_takes_serials_by_the_pattern()
    {
        using var f = new StorageCommandFixture();
        f.Unit(7, fileName: "TME-CF455-15_S0007_IQC-1.s2p");
        string zip = f.Zip("delivery.zip");

        var (code, output, _) = CliFixture.Run(f.Data("import", zip, "--lot", StorageCommandFixture.LotNumber, "--station", StorageCommandFixture.Station,
            "--operator", "R. Haldane", "--serial-pattern", @"_(?<serial>S\d{4})_"));

        Assert.Equal(0, code);
        Assert.Contains("TME-CF455-15_S0007_IQC-1.s2p: S0007: ", output, StringComparison.Ordinal);
        Assert.Equal("S0007", Assert.Single(f.Counted("loss")).Serial);
    }

    [Theory]
    [InlineData("missing-folder", 2)]
    [InlineData("pattern-without-group", 1)]
    [InlineData("no-lot-option", 1)]
    [InlineData("unknown-lot", 1)]
    [InlineData("database-cannot-open", 2)]
    public void Import_exit_codes(string situation, int expected)
    {
        using var f = new StorageCommandFixture();
        f.Unit(1);
        string blocker = Path.Combine(f.Folder, "a-file");
        File.WriteAllText(blocker, "not a folder");
        string[] args = situation switch
        {
            "missing-folder" => f.Data("import", Path.Combine(f.Folder, "nowhere"), "--lot", StorageCommandFixture.LotNumber, "--station", "IQC-1", "--operator", "R. Haldane"),
            "pattern-without-group" => f.Data("import", f.Sweeps, "--lot", StorageCommandFixture.LotNumber, "--station", "IQC-1", "--operator", "R. Haldane", "--serial-pattern", "S\\d+"),
            "no-lot-option" => f.Data("import", f.Sweeps, "--station", "IQC-1", "--operator", "R. Haldane"),
            "unknown-lot" => f.Data("import", f.Sweeps, "--lot", "VP-0000", "--station", "IQC-1", "--operator", "R. Haldane"),
            // The data folder is an existing file, so the SQLite file cannot be created in it.
            _ => ["import", f.Sweeps, "--lot", StorageCommandFixture.LotNumber, "--station", "IQC-1", "--operator", "R. Haldane", "--data", Path.Combine(blocker, "sub")],
        };

        Assert.Equal(expected, CliFixture.Run(args).Code);
    }

    [Fact]
    public async Task Lot_shows_the_plan_counts_and_decision_as_text_and_json()
    {
        using var f = new StorageCommandFixture(quantity: 2);
        f.Unit(1);
        f.Unit(2, DefectKind.HighLoss);
        CliFixture.Run(f.Data("import", f.Sweeps, "--lot", StorageCommandFixture.LotNumber, "--station", "IQC-1", "--operator", "R. Haldane"));
        using var storage = f.Open();
        LotSummary stored = await storage.Lots.GetSummaryAsync(StorageCommandFixture.LotNumber);

        var (code, text, _) = CliFixture.Run(f.Data("lot", StorageCommandFixture.LotNumber));
        Assert.Equal(0, code);
        Assert.Contains($"sample n {stored.Plan.SampleSize}, Ac {stored.Plan.AcceptanceNumber}, Re {stored.Plan.RejectionNumber}", text, StringComparison.Ordinal);
        Assert.Contains($"go {stored.Go}, no-go {stored.NoGo}", text, StringComparison.Ordinal);

        var (jsonCode, json, _) = CliFixture.Run(f.Data("lot", StorageCommandFixture.LotNumber, "--json"));
        Assert.Equal(0, jsonCode);
        using JsonDocument document = JsonDocument.Parse(json);
        JsonElement root = document.RootElement;
        Assert.Equal((2, stored.Go, stored.NoGo), (root.GetProperty("unitsTested").GetInt32(), root.GetProperty("go").GetInt32(), root.GetProperty("noGo").GetInt32()));
        // Final yield is go / tested, an exact ratio of two small counts.
        Assert.Equal((double)stored.Go / 2, root.GetProperty("finalYield").GetDouble());
        Assert.Equal(stored.NoGo, root.GetProperty("failingRules").EnumerateArray().Select(r => r.GetProperty("count").GetInt32()).DefaultIfEmpty(0).Max());
    }

    [Fact]
    public async Task Lot_decide_hold_and_their_exit_codes()
    {
        using var f = new StorageCommandFixture(quantity: 2);
        f.Unit(1);
        CliFixture.Run(f.Data("import", f.Sweeps, "--lot", StorageCommandFixture.LotNumber, "--station", "IQC-1", "--operator", "R. Haldane"));

        // One of two units tested under full inspection: the plan cannot decide yet.
        Assert.Equal(1, CliFixture.Run(f.Data("lot", StorageCommandFixture.LotNumber, "--decide", "--by", "S. Petrova")).Code);
        Assert.Equal(1, CliFixture.Run(f.Data("lot", StorageCommandFixture.LotNumber, "--decide")).Code); // no --by
        Assert.Equal(2, CliFixture.Run(f.Data("lot", "VP-0000")).Code);

        var (held, text, _) = CliFixture.Run(f.Data("lot", StorageCommandFixture.LotNumber, "--hold", "fixture damaged", "--by", "S. Petrova"));
        Assert.Equal(0, held);
        Assert.Contains(", held", text, StringComparison.Ordinal);
        Assert.Equal(0, CliFixture.Run(f.Data("lot", StorageCommandFixture.LotNumber, "--release-hold", "--by", "S. Petrova")).Code);

        f.Unit(2);
        CliFixture.Run(f.Data("import", f.Sweeps, "--lot", StorageCommandFixture.LotNumber, "--station", "IQC-1", "--operator", "R. Haldane"));
        var (decided, after, _) = CliFixture.Run(f.Data("lot", StorageCommandFixture.LotNumber, "--decide", "--by", "S. Petrova"));
        Assert.Equal(0, decided);
        using var storage = f.Open();
        LotSummary lot = await storage.Lots.GetSummaryAsync(StorageCommandFixture.LotNumber);
        Assert.NotEqual(Data.Entities.LotStatus.InTest, lot.Status);
        Assert.Contains("disposition: ", after, StringComparison.Ordinal);
    }

    [Fact]
    public void Reevaluate_with_a_tightened_loss_limit_lists_the_units_whose_stored_loss_fails_it()
    {
        using var f = new StorageCommandFixture();
        for (int i = 1; i <= 6; i++)
        {
            f.Unit(i);
        }
        CliFixture.Run(f.Data("import", f.Sweeps, "--lot", StorageCommandFixture.LotNumber, "--station", "IQC-1", "--operator", "R. Haldane"));
        var losses = f.Counted("loss");
        // Guarded acceptance (ILAC-G8:09/2019 4.2.3): a pass needs limit − measured ≥ the rule's 0.3 dB uncertainty.
        // The limit is put midway between the two middle stored losses so no unit sits near it.
        double[] sorted = losses.Select(l => l.Value!.Value).Order().ToArray();
        double threshold = (sorted[2] + sorted[3]) / 2;
        Assert.True(sorted[3] - sorted[2] > 1e-3, "two stored losses within 1 mdB leave no clear threshold");
        string[] expected = losses.Where(l => l.Verdict == UnitVerdict.Go && l.Value > threshold).Select(l => l.Serial).Order(StringComparer.Ordinal).ToArray();
        string draft = Path.Combine(f.Folder, "draft.yaml");
        LimitTemplate t = f.Template;
        LimitTemplateWriter.WriteFile(LimitTemplate.Create(t.PartNumber, 2, t.Description, t.Device, t.NominalHz, TemplateStatus.Draft, t.Author, null, t.Sweep,
            t.DecisionRule, t.Rules.Select(r => r is InsertionLossRule loss ? new InsertionLossRule(loss.Id, loss.Title, threshold + 0.3, loss.Measure, loss.At, loss.Uncertainty) : r).ToArray()), draft);

        var (code, json, _) = CliFixture.Run(f.Data("reevaluate", "--part", StorageCommandFixture.Part, "--template", draft, "--json"));

        Assert.Equal(0, code);
        using JsonDocument document = JsonDocument.Parse(json);
        string[] flipped = document.RootElement.GetProperty("flips").EnumerateArray().Select(x => x.GetProperty("serial").GetString()!).ToArray();
        Assert.Equal(expected, flipped);
        JsonElement lot = Assert.Single(document.RootElement.GetProperty("lots").EnumerateArray());
        int recordedGo = losses.Count(l => l.Verdict == UnitVerdict.Go);
        Assert.Equal((recordedGo, recordedGo - expected.Length), (lot.GetProperty("recordedGo").GetInt32(), lot.GetProperty("whatIfGo").GetInt32()));

        var (textCode, text, _) = CliFixture.Run(f.Data("reevaluate", "--part", StorageCommandFixture.Part, "--template", draft));
        Assert.Equal(0, textCode);
        Assert.Contains($"{expected.Length} measurements change verdict", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Reevaluate_exit_codes()
    {
        using var f = new StorageCommandFixture();
        string other = CliFixture.ShippedTemplate("TME-LC92-TRAP");
        string broken = Path.Combine(f.Folder, "broken.yaml");
        File.WriteAllText(broken, "format-version: 1\npart: [\n");

        Assert.Equal(1, CliFixture.Run(f.Data("reevaluate", "--template", other)).Code);
        Assert.Equal(2, CliFixture.Run(f.Data("reevaluate", "--part", StorageCommandFixture.Part, "--template", other)).Code);
        Assert.Equal(2, CliFixture.Run(f.Data("reevaluate", "--part", StorageCommandFixture.Part, "--template", broken)).Code);
        Assert.Equal(2, CliFixture.Run(f.Data("reevaluate", "--part", "TME-LC92-TRAP", "--template", other)).Code); // not registered
        Assert.Equal(0, CliFixture.Run(f.Data("reevaluate", "--part", StorageCommandFixture.Part, "--template", CliFixture.ShippedTemplate(StorageCommandFixture.Part))).Code);
    }

    [Fact]
    public void Backup_copies_a_sound_database_and_refuses_an_existing_destination()
    {
        using var f = new StorageCommandFixture();
        f.Unit(1);
        CliFixture.Run(f.Data("import", f.Sweeps, "--lot", StorageCommandFixture.LotNumber, "--station", "IQC-1", "--operator", "R. Haldane"));
        string copy = Path.Combine(f.Folder, "backup.db");

        var (code, output, _) = CliFixture.Run(f.Data("backup", copy));

        Assert.Equal(0, code);
        Assert.Contains("integrity ok", output, StringComparison.Ordinal);
        using (var connection = new SqliteConnection($"Data Source={copy};Mode=ReadOnly;Pooling=False"))
        {
            connection.Open();
            using SqliteCommand count = connection.CreateCommand();
            count.CommandText = "SELECT COUNT(*) FROM measurements";
            Assert.Equal(1L, (long)count.ExecuteScalar()!);
        }
        Assert.Equal(2, CliFixture.Run(f.Data("backup", copy)).Code);
        Assert.Equal(1, CliFixture.Run(f.Data("backup")).Code);
    }
}
