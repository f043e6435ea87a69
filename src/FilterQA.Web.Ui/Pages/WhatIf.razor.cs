using System.Globalization;
using FilterQA.Core.Decisions;
using FilterQA.Core.Templates;
using FilterQA.Data;
using FilterQA.Data.Services;
using FilterQA.Web.Ui.Charts;
using FilterQA.Web.Ui.Services;
using Microsoft.AspNetCore.Components;

namespace FilterQA.Web.Ui.Pages;

/// <summary>
/// The what-if: a stored revision (usually a draft) tried on every stored lot of its part. The run belongs to the
/// circuit's <see cref="WhatIfRunner"/> and runs in the background; the page redraws on its notices, offers Cancel, and
/// cancels the run when it is left.
/// </summary>
public partial class WhatIf : IDisposable
{
    private bool _chartBusy;
    private bool _autoStartPending;

    [Inject]
    private WhatIfRunner Runner { get; set; } = null!;

    [Inject]
    private PartDirectory PartList { get; set; } = null!;

    [Inject]
    private RevisionDirectory RevisionList { get; set; } = null!;

    [Inject]
    private TemplateCatalog Templates { get; set; } = null!;

    [Inject]
    private WhatIfUnitReader UnitReader { get; set; } = null!;

    /// <summary>The part from the address (?part=).</summary>
    [SupplyParameterFromQuery(Name = "part")]
    public string? PartQuery { get; set; }

    /// <summary>The revision from the address (?revision=); with ?part= the run starts at once.</summary>
    [SupplyParameterFromQuery(Name = "revision")]
    public int? RevisionQuery { get; set; }

    private IReadOnlyList<string> Parts { get; set; } = [];

    private IReadOnlyList<RevisionChoice> Revisions { get; set; } = [];

    private string? PartNumber { get; set; }

    private string? RevisionText { get; set; }

    private int? Revision => int.TryParse(RevisionText, NumberStyles.None, CultureInfo.InvariantCulture, out int r) ? r : null;

    private bool Running => Runner.Current.State == WhatIfRunState.Running;

    private string? Problem { get; set; }

    private ChartModel? Chart { get; set; }

    private WhatIfUnitView? ChartUnit { get; set; }

    private string? ChartProblem { get; set; }

    private bool Live { get; set; }

    protected override async Task OnInitializedAsync()
    {
        Runner.Changed += OnRunnerChanged;
        Parts = await PartList.PartNumbersAsync().ConfigureAwait(true);
        if (Runner.Current is { State: not WhatIfRunState.Idle, PartNumber: { } runPart } current)
        {
            // Back on the page within the same circuit: show the run it owns.
            await ChoosePartAsync(runPart, current.Revision).ConfigureAwait(true);
            return;
        }
        if (PartQuery is { Length: > 0 } part)
        {
            if (!Parts.Contains(part, StringComparer.Ordinal))
            {
                Problem = $"Part {part} is not registered.";
                return;
            }
            await ChoosePartAsync(part, RevisionQuery).ConfigureAwait(true);
            if (RevisionQuery is { } wanted)
            {
                if (Revision == wanted)
                {
                    _autoStartPending = true;
                }
                else
                {
                    Problem = string.Create(CultureInfo.InvariantCulture, $"{part} has no revision {wanted}.");
                }
            }
        }
    }

    protected override void OnAfterRender(bool firstRender)
    {
        if (!firstRender)
        {
            return;
        }
        Live = true;
        // Started only once the circuit is live: a prerendered page's services end with the prerender.
        if (_autoStartPending)
        {
            _autoStartPending = false;
            Begin();
        }
        StateHasChanged();
    }

    private async Task PartChangedAsync(ChangeEventArgs e)
    {
        string? part = e.Value as string;
        await ChoosePartAsync(string.IsNullOrEmpty(part) ? null : part, null).ConfigureAwait(true);
    }

    private async Task ChoosePartAsync(string? part, int? revision)
    {
        PartNumber = part;
        Problem = null;
        Revisions = part is null ? [] : await RevisionList.RevisionsAsync(part).ConfigureAwait(true);
        RevisionChoice? chosen = revision is { } r ? Revisions.FirstOrDefault(c => c.Revision == r) : Revisions.FirstOrDefault();
        RevisionText = chosen?.Revision.ToString(CultureInfo.InvariantCulture);
    }

    private Task StartAsync()
    {
        Begin();
        return Task.CompletedTask;
    }

    private void Begin()
    {
        if (PartNumber is not { } part || Revision is not { } revision)
        {
            Problem = "Choose a part and a revision.";
            return;
        }
        Problem = null;
        (Chart, ChartUnit, ChartProblem) = (null, null, null);
        if (!Runner.Start(part, revision))
        {
            Problem = "A what-if is already running; cancel it or wait for it to finish.";
        }
    }

    private void Cancel() => Runner.Cancel();

    private void OnRunnerChanged() => _ = InvokeAsync(StateHasChanged);

    private async Task ShowChartAsync(WhatIfFlip flip)
    {
        if (Runner.Current is not { Report: { } report, PartNumber: { } part })
        {
            return;
        }
        _chartBusy = true;
        ChartProblem = null;
        try
        {
            LimitTemplate draft = await Templates.LoadAsync(part, report.DraftRevision).ConfigureAwait(true);
            WhatIfUnitView unit = await UnitReader.ReadAsync(flip.MeasurementId, draft).ConfigureAwait(true);
            (ChartUnit, Chart) = (unit, WhatIfChartBuilder.Build(unit, report.DraftRevision));
        }
        catch (Exception e) when (e is RecordNotFoundException or ArgumentException or InvalidDataException)
        {
            (ChartUnit, Chart, ChartProblem) = (null, null, Words.Sentence(e.Message));
        }
        finally
        {
            _chartBusy = false;
        }
    }

    /// <summary>Leaving the page stops its run: a what-if nobody looks at only takes the cores from the bench.</summary>
    public void Dispose()
    {
        Runner.Changed -= OnRunnerChanged;
        Runner.Cancel();
        GC.SuppressFinalize(this);
    }

    internal static string ProgressText(WhatIfRunSnapshot run) => run switch
    {
        { State: WhatIfRunState.Running, Progress: null } => "Starting: reading the lots…",
        { State: WhatIfRunState.Running, Progress: { } p } => Invariant($"{p.Evaluated} of {p.Total} measurements judged ({run.Fraction * 100:0} %)…"),
        { State: WhatIfRunState.Finished, Progress: { } p } => Invariant($"Done: {p.Evaluated} of {p.Total} measurements judged."),
        { Progress: { } p } => Invariant($"Stopped after {p.Evaluated} of {p.Total} measurements."),
        _ => "Stopped before the first measurement.",
    };

    private static string OriginalFilesText(WhatIfReport report) => report.WhyOriginalFiles is { } why
        ? Invariant($"{report.FromOriginalFiles} of them were judged from the original sweep file because {why}.")
        : "All were judged from the stored traces.";

    private static string Change(WhatIfLot lot)
    {
        int delta = lot.WhatIfGo - lot.RecordedGo;
        return delta switch
        {
            0 => "no change",
            > 0 => Invariant($"{delta} more go"),
            _ => Invariant($"{-delta} fewer go"),
        };
    }

    private static string Direction(WhatIfFlip flip) => flip.WhatIfVerdict == UnitVerdict.Go ? "to-go" : flip.RecordedVerdict == UnitVerdict.Go ? "to-no-go" : "other";

    private static string FlipCounts(WhatIfReport report)
    {
        int toNoGo = report.Flips.Count(f => f.RecordedVerdict == UnitVerdict.Go);
        int toGo = report.Flips.Count(f => f.WhatIfVerdict == UnitVerdict.Go);
        int other = report.Flips.Count - toNoGo - toGo;
        string rest = other > 0 ? Invariant($", {other} between no-go and not verifiable") : "";
        return Invariant($"{toNoGo} measurement(s) would go from GO to not go, {toGo} from not go to GO{rest}.");
    }

    private static string MeasurementText(WhatIfFlip flip)
    {
        string role = (flip.IsCounted, flip.IsFirstPass) switch
        {
            (true, true) => "first and counted",
            (true, false) => "counted",
            (false, true) => "first",
            _ => "",
        };
        return Invariant($"attempt {flip.Attempt} ({role})");
    }

    private static string ChartCaption(WhatIfUnitView unit, int draftRevision) =>
        Invariant($"Stored loss of unit {unit.Serial} (recorded {Words.Verdict(unit.RecordedVerdict)} against revision {unit.RecordedRevision}) with the limit lines of draft revision {draftRevision} (coloured) and of recorded revision {unit.RecordedRevision} (grey, dash-dot).")
        + (unit.Note is { } note ? " " + note : "");

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
