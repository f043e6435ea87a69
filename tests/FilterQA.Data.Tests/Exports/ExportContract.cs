using System.Globalization;
using System.IO.Compression;
using System.Security.Cryptography;
using System.Text;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Spreadsheet;
using FilterQA.Core.Decisions;
using FilterQA.Core.Formats;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;
using FilterQA.Data.Entities;
using FilterQA.Data.Services;
using FilterQA.Data.Services.Exports;
using FilterQA.Data.Tests.Infrastructure;
using FilterQA.Reports.Exports;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Tests.Exports;

/// <summary>
/// A lot's exports read back with independent readers (an RFC 4180 parser here, OpenXml for the workbook,
/// System.IO.Compression and SHA-256 for the zip) and compared with the stored rows, value for value.
/// </summary>
public abstract class ExportContract : ProviderTestBase
{
    [StorageFact]
    public async Task The_CSV_has_a_header_and_one_row_per_stored_measurement_with_every_rule_value_exactly()
    {
        PreparedLot lot = await LotWithRetestsAsync();
        using var output = new MemoryStream();
        await LotResultsCsv.WriteAsync(new LotExportReader(Store.Contexts), lot.LotNumber, output);
        byte[] bytes = output.ToArray();
        Assert.False(bytes.Length >= 3 && bytes[0] == 0xEF && bytes[1] == 0xBB, "no byte-order mark");
        List<string[]> records = Rfc4180.Parse(new UTF8Encoding(false, throwOnInvalidBytes: true).GetString(bytes));

        List<Row> stored = await StoredRowsAsync(lot.LotNumber);
        string[] header = records[0];
        Assert.Equal(["Serial", "Attempt", "Counted", "Verdict", "Measured at (UTC)", "Station"], header[..6]);
        Assert.Equal(6 + 4 * lot.Template.Rules.Count, header.Length);
        Assert.Contains("loss value (dB)", header);
        Assert.Equal(stored.Count + 1, records.Count);
        for (int i = 0; i < stored.Count; i++)
        {
            string[] r = records[i + 1];
            Row s = stored[i];
            Assert.Equal([s.Serial, s.Attempt.ToString(CultureInfo.InvariantCulture), s.Counts ? "yes" : "no", s.Verdict.ToString(), s.Station], [r[0], r[1], r[2], r[3], r[5]]);
            // The time is written in UTC to 100 ns; the stored value is compared at the precision both providers keep (1 µs).
            DateTimeOffset at = DateTimeOffset.ParseExact(r[4], "yyyy-MM-dd'T'HH:mm:ss.fffffff'Z'", CultureInfo.InvariantCulture, DateTimeStyles.AssumeUniversal);
            Assert.Equal(s.MeasuredAt.UtcTicks / 10, at.UtcTicks / 10);
            foreach (RuleResultRecord rule in s.Rules)
            {
                int column = Array.IndexOf(header, $"{rule.RuleId} value ({Unit(rule.Unit)})");
                Assert.True(column > 0, $"no column for {rule.RuleId}");
                // Exact: the round-trip format gives back the stored double bit for bit (.NET "R" format, parsed with double.Parse).
                Assert.Equal(rule.MeasuredValue, Parse(r[column]));
                Assert.Equal(rule.LimitValue, Parse(r[column + 1]));
                Assert.Equal(rule.Margin, Parse(r[column + 2]));
                Assert.Equal(rule.Outcome.ToString(), r[column + 3]);
            }
        }
    }

    [StorageFact]
    public async Task The_workbook_holds_the_same_rows_as_numbers_and_a_lot_sheet()
    {
        PreparedLot lot = await LotWithRetestsAsync();
        using var output = new MemoryStream();
        await LotResultsWorkbook.WriteAsync(Store.Lots, new LotExportReader(Store.Contexts), lot.LotNumber, output);
        output.Position = 0;

        using SpreadsheetDocument document = SpreadsheetDocument.Open(output, false);
        Dictionary<string, Dictionary<string, Cell>>[] results = Sheet(document, "Results");
        Dictionary<string, Dictionary<string, Cell>>[] lotSheet = Sheet(document, "Lot");
        List<Row> stored = await StoredRowsAsync(lot.LotNumber);
        Assert.Equal(stored.Count + 1, results.Length);
        Dictionary<string, string> columns = results[0].Single().Value.ToDictionary(c => Text(c.Value), c => c.Key);
        for (int i = 0; i < stored.Count; i++)
        {
            Dictionary<string, Cell> row = results[i + 1].Single().Value;
            Row s = stored[i];
            Assert.Equal(s.Serial, Text(row[columns["Serial"]]));
            Assert.Equal(s.Attempt, Number(row[columns["Attempt"]]));
            foreach (RuleResultRecord rule in s.Rules)
            {
                string unit = Unit(rule.Unit);
                // Exact: the cell holds the round-trip text of the stored double.
                Assert.Equal(rule.MeasuredValue, NumberOrNull(row, columns[$"{rule.RuleId} value ({unit})"]));
                Assert.Equal(rule.LimitValue, NumberOrNull(row, columns[$"{rule.RuleId} limit ({unit})"]));
                Assert.Equal(rule.Margin, NumberOrNull(row, columns[$"{rule.RuleId} margin ({unit})"]));
                Assert.Equal(rule.Outcome.ToString(), Text(row[columns[$"{rule.RuleId} outcome"]]));
            }
        }
        Dictionary<string, Cell> Field(string name) => lotSheet.Select(r => r.Single().Value).Single(r => Text(r["A"]) == name);
        Assert.Equal(lot.LotNumber, Text(Field("Lot")["B"]));
        Assert.Equal("Brackwater Shipyards", Text(Field("Customer")["B"]));
        Assert.Equal(6, Number(Field("Quantity received")["B"]));
        Assert.Equal(stored.Count, Number(Field("Measurements")["B"]));
    }

    [StorageFact]
    public async Task The_sweeps_zip_holds_every_stored_sweep_byte_for_byte_or_as_csv()
    {
        PreparedLot lot = await Store.PrepareLotAsync(PlanRequest.FullInspection(), quantity: 5);
        var submitted = new Dictionary<string, List<string>>(StringComparer.Ordinal);
        foreach ((int index, string serial) in new[] { (1, "S0001"), (2, "S0002"), (2, "S0002"), (3, "S0003") })
        {
            (byte[] bytes, string fileName) = DemoFiles.NetworkUnit(index);
            await Store.Intake.SubmitAsync(DemoFiles.Submission(lot, serial, (bytes, fileName)) with { RetestReason = "re-seated the unit" });
            // Reference: FIPS 180-4 SHA-256 of the bytes this test sent.
            submitted.TryAdd(serial, []);
            submitted[serial].Add(Convert.ToHexStringLower(SHA256.HashData(bytes)));
        }

        using var original = new MemoryStream();
        await LotSweepsArchive.WriteAsync(new LotExportReader(Store.Contexts), lot.LotNumber, SweepExportFormat.Touchstone, new WriteOnly(original));
        using (var zip = new ZipArchive(new MemoryStream(original.ToArray()), ZipArchiveMode.Read))
        {
            Assert.Equal(4, zip.Entries.Count);
            foreach ((string serial, List<string> hashes) in submitted)
            {
                for (int attempt = 1; attempt <= hashes.Count; attempt++)
                {
                    ZipArchiveEntry entry = Assert.Single(zip.Entries, e => e.FullName.StartsWith($"{serial}/attempt-{attempt}/", StringComparison.Ordinal));
                    Assert.EndsWith(".s2p", entry.FullName, StringComparison.Ordinal);
                    using var content = new MemoryStream();
                    await using (Stream s = entry.Open())
                    {
                        await s.CopyToAsync(content);
                    }
                    Assert.Equal(hashes[attempt - 1], Convert.ToHexStringLower(SHA256.HashData(content.ToArray())));
                }
            }
        }

        using var csv = new MemoryStream();
        await LotSweepsArchive.WriteAsync(new LotExportReader(Store.Contexts), lot.LotNumber, SweepExportFormat.Csv, new WriteOnly(csv));
        using (var zip = new ZipArchive(new MemoryStream(csv.ToArray()), ZipArchiveMode.Read))
        {
            Assert.Equal(4, zip.Entries.Count);
            ZipArchiveEntry first = Assert.Single(zip.Entries, e => e.FullName == "S0001/attempt-1/S0001.csv");
            using var content = new MemoryStream();
            await using (Stream s = first.Open())
            {
                await s.CopyToAsync(content);
            }
            Sweep fromCsv = SweepFileReader.Read(content.ToArray(), "S0001.csv");
            Sweep fromOriginal = SweepFileReader.Read(DemoFiles.NetworkUnit(1).Bytes, "S0001.s2p");
            Assert.Equal(fromOriginal.Grid.Count, fromCsv.Grid.Count);
            // The delimited writer prints frequencies in round-trip form: equal to the last bit.
            Assert.Equal(fromOriginal.Grid.Hz.ToArray(), fromCsv.Grid.Hz.ToArray());
        }
    }

    [StorageFact]
    public async Task An_unknown_lot_is_refused_before_anything_is_written()
    {
        var reader = new LotExportReader(Store.Contexts);
        using var output = new MemoryStream();
        await Assert.ThrowsAsync<RecordNotFoundException>(() => LotResultsCsv.WriteAsync(reader, "VP-2611-NONE", output));
        await Assert.ThrowsAsync<RecordNotFoundException>(() => LotSweepsArchive.WriteAsync(reader, "VP-2611-NONE", SweepExportFormat.Csv, output));
        Assert.Equal(0, output.Length);
    }

    // Units with a retest, a failing rule and a not-verifiable unit, so the export has every kind of row.
    private async Task<PreparedLot> LotWithRetestsAsync()
    {
        PreparedLot lot = await Store.PrepareLotAsync(PlanRequest.FullInspection(), quantity: 6, retests: new Core.Statistics.RetestPolicy(1));
        (string Serial, UnitVerdict Verdict, string[] Failing)[] attempts =
        [
            ("S0001", UnitVerdict.Go, []),
            ("S0002", UnitVerdict.NoGo, ["loss"]),
            ("S0002", UnitVerdict.Go, []),
            ("S,0003 \"quoted\"", UnitVerdict.NotVerifiable, []),
            ("S0004", UnitVerdict.NoGo, ["bw-6db", "loss"]),
        ];
        int seed = 1;
        foreach ((string serial, UnitVerdict verdict, string[] failing) in attempts)
        {
            await Store.Measurements.StoreAsync(Samples.Measurement(lot.LotNumber, serial, lot.Template, verdict, lot.Station, Store.Clock.GetUtcNow(), seed++, failing));
            Store.Clock.Advance(TimeSpan.FromSeconds(37.1234567));
        }
        return lot;
    }

    private async Task<List<Row>> StoredRowsAsync(string lotNumber)
    {
        await using FilterQaDbContext context = Store.NewContext();
        long lotId = await context.Lots.Where(l => l.LotNumber == lotNumber).Select(l => l.Id).SingleAsync();
        var rows = await context.Measurements.AsNoTracking().Include(m => m.Rules).Include(m => m.Station).Where(m => m.LotId == lotId)
            .Join(context.Units, m => m.UnitId, u => u.Id, (m, u) => new { m, u.Serial, u.SamplePosition }).ToListAsync();
        return rows.OrderBy(r => r.SamplePosition).ThenBy(r => r.m.Attempt)
            .Select(r => new Row(r.Serial, r.m.Attempt, r.m.CountsForLot, r.m.Verdict, r.m.MeasuredAt, r.m.Station!.Name, r.m.Rules.OrderBy(x => x.Ordinal).ToArray()))
            .ToList();
    }

    private static string Unit(RuleUnit unit) => unit.Symbol() is { Length: > 0 } s ? s : "ratio";

    private static double? Parse(string field) => field.Length == 0 ? null : double.Parse(field, NumberStyles.Float, CultureInfo.InvariantCulture);

    // Rows of a sheet: per row its index → (column letters → cell).
    private static Dictionary<string, Dictionary<string, Cell>>[] Sheet(SpreadsheetDocument document, string name)
    {
        WorkbookPart workbook = document.WorkbookPart!;
        Sheet sheet = workbook.Workbook.Sheets!.Elements<Sheet>().Single(s => s.Name == name);
        var part = (WorksheetPart)workbook.GetPartById(sheet.Id!);
        return part.Worksheet.Descendants<DocumentFormat.OpenXml.Spreadsheet.Row>()
            .Select(r => new Dictionary<string, Dictionary<string, Cell>>
            {
                [r.RowIndex!.Value.ToString(CultureInfo.InvariantCulture)] = r.Elements<Cell>()
                    .ToDictionary(c => new string(c.CellReference!.Value!.TakeWhile(char.IsLetter).ToArray()), c => c),
            }).ToArray();
    }

    private static string Text(Cell cell)
    {
        Assert.Equal(CellValues.InlineString, cell.DataType!.Value);
        return cell.InlineString!.InnerText;
    }

    private static double Number(Cell cell)
    {
        Assert.Equal(CellValues.Number, cell.DataType!.Value);
        return double.Parse(cell.CellValue!.Text, NumberStyles.Float, CultureInfo.InvariantCulture);
    }

    private static double? NumberOrNull(Dictionary<string, Cell> row, string column) => row.TryGetValue(column, out Cell? cell) ? Number(cell) : null;

    private sealed record Row(string Serial, int Attempt, bool Counts, UnitVerdict Verdict, DateTimeOffset MeasuredAt, string Station, RuleResultRecord[] Rules);

    /// <summary>A stream that cannot seek or read, like an HTTP response body, so the zip must be written forward only.</summary>
    private sealed class WriteOnly(Stream inner) : Stream
    {
        public override bool CanRead => false;
        public override bool CanSeek => false;
        public override bool CanWrite => true;
        public override long Length => throw new NotSupportedException();
        public override long Position { get => throw new NotSupportedException(); set => throw new NotSupportedException(); }
        public override void Flush() => inner.Flush();
        public override int Read(byte[] buffer, int offset, int count) => throw new NotSupportedException();
        public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException();
        public override void SetLength(long value) => throw new NotSupportedException();
        public override void Write(byte[] buffer, int offset, int count) => throw new NotSupportedException("synchronous write, as a server response refuses");
        public override ValueTask WriteAsync(ReadOnlyMemory<byte> buffer, CancellationToken cancellationToken = default) => inner.WriteAsync(buffer, cancellationToken);
        public override Task WriteAsync(byte[] buffer, int offset, int count, CancellationToken cancellationToken) => inner.WriteAsync(buffer, offset, count, cancellationToken);
        public override Task FlushAsync(CancellationToken cancellationToken) => inner.FlushAsync(cancellationToken);
    }
}
