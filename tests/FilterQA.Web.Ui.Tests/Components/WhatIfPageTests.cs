using System.Security.Claims;
using Bunit;
using FilterQA.Core.Decisions;
using FilterQA.Core.Templates;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using FilterQA.Web.Ui.Pages;
using FilterQA.Web.Ui.Services;
using FilterQA.Web.Ui.Tests.Infrastructure;
using Microsoft.AspNetCore.Components;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.DependencyInjection.Extensions;

namespace FilterQA.Web.Ui.Tests.Components;

/// <summary>The what-if page with a slow stand-in engine: progress while it runs, Cancel, and leaving the page.</summary>
public sealed class WhatIfPageTests : SeededStore
{
    private static readonly TimeSpan Wait = TimeSpan.FromSeconds(20);

    private readonly SlowEngine _engine = new();

    public WhatIfPageTests()
    {
        Services.RemoveAll<IWhatIfEngine>();
        Services.AddSingleton<IWhatIfEngine>(_engine);
        var auth = AddAuthorization();
        auth.SetAuthorized("J. Lindqvist");
        auth.SetRoles(RoleNames.QualityEngineer);
        auth.SetClaims(new Claim(ClaimTypes.NameIdentifier, "u-jlindqvist"));
    }

    private async Task SeedDraftAsync()
    {
        await SeedAsync();
        TemplateCatalog catalog = Services.GetRequiredService<TemplateCatalog>();
        LimitTemplate released = await catalog.LoadAsync(PartNumber, 1);
        await catalog.RegisterAsync(Drafts.WiderCentreNarrowerBandwidth(released), Engineer);
    }

    private IRenderedComponent<WhatIf> RenderWithAddress(string address)
    {
        Services.GetRequiredService<NavigationManager>().NavigateTo(address);
        return Render<WhatIf>();
    }

    [Fact]
    public async Task The_draft_is_offered_first_and_a_run_shows_its_progress_then_cancel_shows_nothing_half_done()
    {
        await SeedDraftAsync();
        var cut = Render<WhatIf>();
        cut.Find("#w-part").Change(PartNumber);
        cut.WaitForAssertion(() => Assert.Equal("2", cut.Find("#w-revision").GetAttribute("value") ?? cut.Find("#w-revision option").GetAttribute("value")), Wait);
        Assert.Contains("draft", cut.Find("#w-revision option").TextContent, StringComparison.Ordinal);

        cut.Find("form.whatif-choice").Submit();
        await _engine.Started.Task.WaitAsync(Wait);
        Assert.Equal((PartNumber, 2), (_engine.PartNumber, _engine.Revision));
        _engine.Report(new WhatIfProgress(40, 100));
        cut.WaitForAssertion(() => Assert.Equal("40", cut.Find(".whatif-progress progress").GetAttribute("value")), Wait);
        Assert.Equal("100", cut.Find(".whatif-progress progress").GetAttribute("max"));
        Assert.Contains("40 of 100 measurements judged (40 %)", cut.Find(".progress-text").TextContent, StringComparison.Ordinal);
        Assert.True(cut.Find("#w-run").HasAttribute("disabled"));

        cut.Find("#w-cancel").Click();
        cut.WaitForAssertion(() => Assert.Equal("Cancelled", cut.Find(".whatif-progress").GetAttribute("data-state")), Wait);
        Assert.True(_engine.Token.IsCancellationRequested);
        Assert.Contains("cancelled", cut.Find(".whatif-progress .cancelled").TextContent, StringComparison.Ordinal);
        Assert.Contains("Stopped after 40 of 100", cut.Find(".progress-text").TextContent, StringComparison.Ordinal);
        Assert.Empty(cut.FindAll("table.whatif-lots"));
        Assert.Empty(cut.FindAll("table.whatif-flips"));
        Assert.Empty(cut.FindAll("#w-cancel"));
    }

    [Fact]
    public async Task A_finished_run_from_the_address_lists_the_lots_and_the_units_that_flip()
    {
        await SeedDraftAsync();
        var cut = RenderWithAddress($"whatif?part={PartNumber}&revision=2");
        await _engine.Started.Task.WaitAsync(Wait);
        _engine.Finish(new WhatIfReport(PartNumber, 2, "sha256:test", [new WhatIfLot(LotNumber, 1, 20, 18, 17, 16, 15)],
        [
            new WhatIfFlip(LotNumber, "S0004", 41, 1, true, true, UnitVerdict.Go, UnitVerdict.NoGo,
                [new RuleResult("bw-6db", RuleKind.Bandwidth, "6 dB bandwidth", RuleUnit.Hertz, 18.9e3, 19e3, LimitSense.AtLeast, -100, 200,
                    RuleOutcome.Fail, false, null, "6 dB bandwidth 18.900 kHz, limit 19.000 kHz")]),
        ], 21, 0, null));

        cut.WaitForElement("table.whatif-lots tbody tr", Wait);
        string lot = cut.Find("table.whatif-lots tbody tr").TextContent;
        // 18 of 20 = 90.0 %, 17 of 20 = 85.0 % (final); 16 and 15 of 20 = 80.0 % and 75.0 % (first pass).
        foreach (string expected in (string[])["90.0 %", "85.0 %", "80.0 %", "75.0 %", "1 fewer go"])
        {
            Assert.Contains(expected, lot, StringComparison.Ordinal);
        }
        var flip = cut.Find("table.whatif-flips tbody tr");
        Assert.Equal("to-no-go", flip.GetAttribute("data-direction"));
        Assert.Contains("bw-6db", flip.TextContent, StringComparison.Ordinal);
        Assert.Contains("18.900 kHz", flip.TextContent, StringComparison.Ordinal);
        Assert.Contains("Done: 21 of 21", cut.Find(".progress-text").TextContent, StringComparison.Ordinal);
        Assert.Contains("1 measurement(s) would go from GO to not go, 0 from not go to GO", cut.Markup, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Leaving_the_page_cancels_its_run()
    {
        await SeedDraftAsync();
        var cut = RenderWithAddress($"whatif?part={PartNumber}&revision=2");
        await _engine.Started.Task.WaitAsync(Wait);
        WhatIfRunner runner = Services.GetRequiredService<WhatIfRunner>();
        Assert.Equal(WhatIfRunState.Running, runner.Current.State);

        await DisposeComponentsAsync();
        await runner.Completion.WaitAsync(Wait);
        Assert.True(_engine.Token.IsCancellationRequested);
        Assert.Equal(WhatIfRunState.Cancelled, runner.Current.State);
        Assert.Null(runner.Current.Report);
    }

    [Fact]
    public async Task An_unknown_revision_in_the_address_is_named_and_nothing_runs()
    {
        await SeedDraftAsync();
        var cut = RenderWithAddress($"whatif?part={PartNumber}&revision=9");
        cut.WaitForElement("p.problem", Wait);
        Assert.Contains("has no revision 9", cut.Find("p.problem").TextContent, StringComparison.Ordinal);
        Assert.False(_engine.Started.Task.IsCompleted);
    }

    /// <summary>An engine that runs until told to report, finish, or is cancelled.</summary>
    private sealed class SlowEngine : IWhatIfEngine
    {
        private readonly TaskCompletionSource<WhatIfReport> _result = new(TaskCreationOptions.RunContinuationsAsynchronously);
        private IProgress<WhatIfProgress>? _progress;

        public TaskCompletionSource Started { get; } = new(TaskCreationOptions.RunContinuationsAsynchronously);

        public string? PartNumber { get; private set; }

        public int Revision { get; private set; }

        public CancellationToken Token { get; private set; }

        public async Task<WhatIfReport> RunAsync(string partNumber, int revision, IProgress<WhatIfProgress> progress, CancellationToken cancellationToken)
        {
            (PartNumber, Revision, Token, _progress) = (partNumber, revision, cancellationToken, progress);
            Started.TrySetResult();
            return await _result.Task.WaitAsync(cancellationToken);
        }

        public void Report(WhatIfProgress value) => _progress!.Report(value);

        public void Finish(WhatIfReport report) => _result.TrySetResult(report);
    }
}
