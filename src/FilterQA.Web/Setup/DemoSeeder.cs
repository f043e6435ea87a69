using System.Diagnostics;
using System.Numerics;
using System.Text;
using FilterQA.Core.Formats;
using FilterQA.Core.Formats.Delimited;
using FilterQA.Core.Formats.Touchstone;
using FilterQA.Core.Sampling;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Synthesis;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Text;
using FilterQA.Data;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;

namespace FilterQA.Web.Setup;

/// <summary>
/// Loads the invented demo scenario once: stations IQC-1 (network analyser, with a network thru) and IQC-2
/// (generator and spectrum analyser, with a power thru for the 455 kHz filter), the released demo templates,
/// and lots tested through <see cref="SweepIntake"/> with synthetic units: two pass, one fails on rejection,
/// one on centre-frequency drift, one crystal lot has a unit whose unwanted mode is too strong, and one is
/// half tested so the bench has work. The first two go units of each part's first lot become its reference units, so
/// a draft of the part can be checked and released. Synthetic data for demonstrations only.
/// </summary>
internal sealed class DemoSeeder(TemplateCatalog templates, StationRegistry stations, LotService lots, SweepIntake intake,
    ReferenceUnitService referenceUnits, TimeProvider clock, ILogger<DemoSeeder> log)
{
    private const ulong Seed = 2611;
    private const string Customer = "Brackwater Shipyards";

    // Lots of 500 are sampled n = 80, Ac 1, Re 2 (level II, normal, AQL 0.65); a failing lot is decided once its
    // second defective is found. The trays of 50 are sampled n = 20, Ac 0, Re 1.
    internal static readonly DemoLot[] Lots =
    [
        new("VP-2611-0042", "TME-CF455-15", "Veltrane Piezo", 50, "2544", "VPZ-44817", "IQC-1", "rhaldane", null, new Dictionary<int, DefectKind>(), true),
        new("OA-2611-0107", "TME-SF70M-1M2", "Ostmark Acoustic", 50, "2543", "OAK-7781", "IQC-1", "mokafor", null, new Dictionary<int, DefectKind>(), true),
        new("OA-2611-0108", "TME-SF162-AIS", "Ostmark Acoustic", 500, "2545", "OAK-7790", "IQC-1", "mokafor", 4,
            new Dictionary<int, DefectKind> { [2] = DefectKind.LowRejection, [4] = DefectKind.LowRejection }, true),
        new("VP-2611-0043", "TME-CF455-15", "Veltrane Piezo", 500, "2545", "VPZ-44862", "IQC-2", "rhaldane", 5,
            new Dictionary<int, DefectKind> { [3] = DefectKind.CentreDrift, [5] = DefectKind.CentreDrift }, true),
        new("QQ-2611-0019", "TME-XR24M-18", "Quorra Quartz", 500, "2542", "QQ-R-3310", "IQC-1", "rhaldane", 7,
            new Dictionary<int, DefectKind> { [4] = DefectKind.StrongUnwantedMode, [7] = DefectKind.StrongUnwantedMode }, true),
        new("QQ-2611-0020", "TME-XF21M4-15", "Quorra Quartz", 500, "2546", "QQ-F-1207", "IQC-1", "mokafor", 6, new Dictionary<int, DefectKind>(), false),
    ];

    public async Task SeedAsync(string templatesFolder, IReadOnlyDictionary<string, FilterQaUser> people, CancellationToken cancellationToken)
    {
        var watch = Stopwatch.StartNew();
        Actor engineer = ActorOf(people, "jlindqvist");
        Actor approver = ActorOf(people, "spetrova");

        int registered = 0;
        foreach (string path in Directory.EnumerateFiles(templatesFolder, "*.yaml").Order(StringComparer.Ordinal))
        {
            TemplateReadResult read = LimitTemplateReader.ReadFile(path);
            LimitTemplate template = read.Template ?? throw new InvalidOperationException(
                $"demo template {Path.GetFileName(path)} does not read: {string.Join("; ", read.Problems)}");
            await templates.RegisterAsync(template, engineer, cancellationToken).ConfigureAwait(false);
            registered++;
        }
        if (registered == 0)
        {
            throw new InvalidOperationException($"no demo templates (*.yaml) in {templatesFolder}; set Demo:TemplatesFolder");
        }

        var synthesiser = new UnitSynthesiser(Seed);
        await stations.RegisterStationAsync("IQC-1", "Network analyser bench 1 (demo)", engineer, cancellationToken).ConfigureAwait(false);
        await stations.RegisterStationAsync("IQC-2", "Stepped generator and spectrum analyser bench 2 (demo)", engineer, cancellationToken).ConfigureAwait(false);
        await RecordThruAsync("IQC-1", NetworkThru(), ActorOf(people, "rhaldane"), cancellationToken).ConfigureAwait(false);
        await RecordThruAsync("IQC-2", PowerThru(synthesiser, "IQC-2"), ActorOf(people, "rhaldane"), cancellationToken).ConfigureAwait(false);

        // Lots are independent: two at a time keeps both cores busy with synthesis and evaluation while
        // the other lot's transaction is written.
        int units = 0;
        await Parallel.ForEachAsync(Lots, new ParallelOptions { MaxDegreeOfParallelism = 2, CancellationToken = cancellationToken }, async (lot, token) =>
        {
            int tested = await SeedLotAsync(lot, synthesiser, people, engineer, approver, token).ConfigureAwait(false);
            Interlocked.Add(ref units, tested);
        }).ConfigureAwait(false);
        int references = await MarkReferenceUnitsAsync(engineer, cancellationToken).ConfigureAwait(false);
        log.LogInformation("Demo data loaded: {Templates} templates, {Lots} lots, {Units} units, {References} reference units in {Seconds:0.0} s",
            registered, Lots.Length, units, references, watch.Elapsed.TotalSeconds);
    }

    private async Task<int> SeedLotAsync(DemoLot lot, UnitSynthesiser synthesiser, IReadOnlyDictionary<string, FilterQaUser> people,
        Actor engineer, Actor approver, CancellationToken cancellationToken)
    {
        var request = new NewLot(lot.LotNumber, lot.PartNumber, null, lot.Supplier, lot.Quantity,
            PlanRequest.Mil105E(InspectionLevel.II, 0.65, InspectionSeverity.Normal))
        {
            DateCode = lot.DateCode,
            SupplierLot = lot.SupplierLot,
            Customer = Customer,
            PurchaseOrder = "PO-TME-" + lot.LotNumber[^4..],
        };
        var watch = Stopwatch.StartNew();
        LotSummary summary = await lots.CreateLotAsync(request, engineer, cancellationToken).ConfigureAwait(false);
        DemoPart part = DemoParts.Get(lot.PartNumber);
        Actor operatorActor = ActorOf(people, lot.OperatorUserName);
        int count = Math.Min(lot.UnitsToTest ?? summary.Plan.SampleSize, summary.Plan.SampleSize);
        for (int index = 1; index <= count; index++)
        {
            DefectKind defect = lot.Defects.TryGetValue(index, out DefectKind kind) ? kind : DefectKind.None;
            Sweep unit = synthesiser.Unit(part, index, defect);
            byte[] bytes = Encoding.UTF8.GetBytes(TouchstoneWriter.WriteToString(unit, new TouchstoneWriteOptions
            {
                FrequencyUnit = FrequencyUnit.Hz,
                DataFormat = TouchstoneDataFormat.DecibelAngle,
                Comments = [$"synthetic demo unit of {part.PartNumber}; demo data only"],
            }));
            await intake.SubmitAsync(new SweepSubmission(lot.LotNumber, UnitSynthesiser.Serial(index), lot.Station, operatorActor, bytes,
                unit.Source.FileName), cancellationToken).ConfigureAwait(false);
        }
        if (lot.Decide)
        {
            await lots.DecideAsync(lot.LotNumber, approver, cancellationToken).ConfigureAwait(false);
        }
        log.LogInformation("Demo lot {Lot} ({Part}): {Units} units tested in {Seconds:0.0} s", lot.LotNumber, lot.PartNumber, count, watch.Elapsed.TotalSeconds);
        return count;
    }

    /// <summary>Marks the first two go units (first attempts) of each demo part's first lot as its reference units.</summary>
    private async Task<int> MarkReferenceUnitsAsync(Actor engineer, CancellationToken cancellationToken)
    {
        const int PerPart = 2;
        int marked = 0;
        foreach (DemoLot lot in Lots.DistinctBy(l => l.PartNumber))
        {
            IReadOnlyList<ReferenceCandidate> candidates = await referenceUnits.CandidatesAsync(lot.PartNumber, lot.LotNumber, cancellationToken).ConfigureAwait(false);
            foreach (ReferenceCandidate unit in candidates.Where(c => c.Attempt == 1 && c.Verdict == FilterQA.Core.Decisions.UnitVerdict.Go).Take(PerPart))
            {
                await referenceUnits.AddAsync(lot.PartNumber, unit.MeasurementId, "demo: known-good unit, cross-checked on a second analyser", engineer,
                    cancellationToken).ConfigureAwait(false);
                marked++;
            }
        }
        return marked;
    }

    private async Task RecordThruAsync(string station, (byte[] Bytes, string FileName) file, Actor actor, CancellationToken cancellationToken)
    {
        Sweep sweep = SweepFileReader.Read(file.Bytes, file.FileName);
        await stations.RecordThruAsync(new ThruInput(station, file.Bytes, sweep, ResponseTrace.Primary(sweep), clock.GetUtcNow(), actor),
            cancellationToken).ConfigureAwait(false);
    }

    // A thru line as a network analyser sees it: |S21| a few hundredths of a dB below 1 with a slight cable
    // ripple and no delay (so phase interpolation between its points is exact), 10 kHz to 300 MHz, log spaced.
    private static (byte[], string) NetworkThru()
    {
        const int n = 1601;
        var hz = new double[n];
        for (int i = 0; i < n; i++)
        {
            hz[i] = 10e3 * Math.Pow(300e6 / 10e3, i / (double)(n - 1));
        }
        var grid = FrequencyGrid.FromHz(hz);
        var s = new Complex[n, 2, 2];
        for (int i = 0; i < n; i++)
        {
            double lossDb = 0.03 + 0.02 * Math.Sin(i / 97.0);
            var through = new Complex(Math.Pow(10, -lossDb / 20), 0);
            s[i, 0, 0] = new Complex(0.01, 0);
            s[i, 1, 1] = new Complex(0.01, 0);
            s[i, 1, 0] = through;
            s[i, 0, 1] = through;
        }
        Sweep thru = Sweep.FromNetwork(NetworkData.Create(grid, s, [50, 50]), SweepSource.Of("IQC-1_thru.s2p", SweepFormat.Synthetic));
        string text = TouchstoneWriter.WriteToString(thru, new TouchstoneWriteOptions
        {
            FrequencyUnit = FrequencyUnit.Hz,
            DataFormat = TouchstoneDataFormat.DecibelAngle,
            Comments = ["synthetic demo thru of station IQC-1; demo data only"],
        });
        return (Encoding.UTF8.GetBytes(text), "IQC-1_thru.s2p");
    }

    private static (byte[], string) PowerThru(UnitSynthesiser synthesiser, string station)
    {
        Sweep thru = synthesiser.PowerThru(DemoParts.Get("TME-CF455-15"), station);
        using var writer = new StringWriter(System.Globalization.CultureInfo.InvariantCulture);
        DelimitedTextWriter.Write(thru, writer);
        return (Encoding.UTF8.GetBytes(writer.ToString()), thru.Source.FileName);
    }

    private static Actor ActorOf(IReadOnlyDictionary<string, FilterQaUser> people, string userName) =>
        people.TryGetValue(userName, out FilterQaUser? user)
            ? new Actor(user.Id, user.DisplayName, userName == "spetrova")
            : throw new InvalidOperationException($"the demo account {userName} is missing; demo data needs the demo accounts");
}
