using FilterQA.Core.Synthesis;
using FilterQA.Data.Services;
using FilterQA.Web.Tests.Infrastructure;
using FilterQA.Web.Watching;
using Microsoft.Extensions.DependencyInjection;

namespace FilterQA.Web.Tests.Watching;

/// <summary>A station's watched folder: files in, done/ or failed/ out, nothing lost, nothing twice, no path outside.</summary>
public sealed class WatchFolderTests : IDisposable
{
    private readonly TempFolder _data = new();
    private readonly TempFolder _outside = new();
    private readonly string _inbox;
    private readonly WebFactory _factory;

    public WatchFolderTests()
    {
        _inbox = Path.Combine(_outside.Path, "inbox");
        Directory.CreateDirectory(_inbox);
        _factory = new WebFactory(_data.Path, new Dictionary<string, string?>
        {
            ["Stations:IQC-1:WatchFolder"] = _inbox,
            ["Watch:StableSeconds"] = "0",
        });
    }

    public void Dispose()
    {
        _factory.Dispose();
        _data.Dispose();
        _outside.Dispose();
    }

    private WatchFolderIngestor Folder => _factory.Services.GetRequiredService<WatchFolders>().For("IQC-1");

    [Fact]
    public async Task A_good_file_ends_in_done_and_is_stored_once_even_when_dropped_twice()
    {
        string lot = await Bench.PrepareLotAsync(_factory);
        string name = lot + "__S0001.s2p";
        string sweep = Bench.UnitTouchstone();
        await File.WriteAllTextAsync(Path.Combine(_inbox, name), sweep);
        Assert.Equal(1, await Folder.ScanOnceAsync());
        await File.WriteAllTextAsync(Path.Combine(_inbox, name), sweep);
        Assert.Equal(1, await Folder.ScanOnceAsync());

        Assert.Equal(2, Directory.GetFiles(Folder.Done, "*.s2p").Length);
        Assert.Empty(Directory.GetFiles(Folder.Failed));
        Assert.Empty(Directory.GetFiles(Folder.Processing));
        Assert.Empty(Directory.GetFiles(_inbox));
        await using AsyncServiceScope scope = _factory.Services.CreateAsyncScope();
        LotSummary summary = await scope.ServiceProvider.GetRequiredService<LotService>().GetSummaryAsync(lot);
        Assert.Equal(1, summary.UnitsTested);
        Assert.Equal(1, summary.Measurements);
    }

    [Fact]
    public async Task A_garbage_file_ends_in_failed_with_a_reason()
    {
        string lot = await Bench.PrepareLotAsync(_factory);
        string name = lot + "__S0002.s2p";
        await File.WriteAllTextAsync(Path.Combine(_inbox, name), "# Hz S DB R 50\nnot numbers at all\n");
        await Folder.ScanOnceAsync();
        Assert.True(File.Exists(Path.Combine(Folder.Failed, name)));
        string reason = await File.ReadAllTextAsync(Path.Combine(Folder.Failed, name + ".reason.txt"));
        Assert.Contains(name, reason, StringComparison.Ordinal);
        Assert.Contains("line 2", reason, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_file_for_an_unknown_lot_ends_in_failed_naming_the_lot()
    {
        await Bench.PrepareLotAsync(_factory);
        await File.WriteAllTextAsync(Path.Combine(_inbox, "VP-2611-7777__S0001.s2p"), Bench.UnitTouchstone());
        await Folder.ScanOnceAsync();
        string reason = await File.ReadAllTextAsync(Path.Combine(Folder.Failed, "VP-2611-7777__S0001.s2p.reason.txt"));
        Assert.Contains("VP-2611-7777", reason, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("no-separator.s2p")]
    [InlineData("..__S0001.s2p")]
    [InlineData("VP-2611-0042__S0001.exe")]
    [InlineData("VP-2611-0042__S\u0001.s2p")]
    [InlineData("VP-2611-0042__S0001 .s2p ")]
    public async Task A_hostile_name_is_moved_to_failed_under_a_name_of_our_own(string name)
    {
        string[] outsideBefore = Directory.GetFileSystemEntries(_outside.Path);
        await File.WriteAllTextAsync(Path.Combine(_inbox, name), Bench.UnitTouchstone());
        await Folder.ScanOnceAsync();
        Assert.Empty(Directory.GetFiles(_inbox));
        string moved = Assert.Single(Directory.GetFiles(Folder.Failed, "refused-*.bin"));
        Assert.Contains("refused file name", await File.ReadAllTextAsync(moved + ".reason.txt"), StringComparison.Ordinal);
        Assert.Equal(outsideBefore, Directory.GetFileSystemEntries(_outside.Path));
    }

    [Fact]
    public async Task An_over_long_name_is_refused()
    {
        string name = "VP-2611-0042__" + new string('S', 180) + ".s2p";
        await File.WriteAllTextAsync(Path.Combine(_inbox, name), "x");
        await Folder.ScanOnceAsync();
        Assert.Single(Directory.GetFiles(Folder.Failed, "refused-*.bin"));
    }

    [Fact]
    public async Task A_symbolic_link_is_moved_without_following_it_and_its_target_is_untouched()
    {
        string lot = await Bench.PrepareLotAsync(_factory);
        string target = Path.Combine(_outside.Path, "secret.s2p");
        await File.WriteAllTextAsync(target, Bench.UnitTouchstone());
        File.CreateSymbolicLink(Path.Combine(_inbox, lot + "__S0003.s2p"), target);
        await Folder.ScanOnceAsync();
        Assert.True(File.Exists(target));
        Assert.Equal(Bench.UnitTouchstone(), await File.ReadAllTextAsync(target));
        Assert.Single(Directory.GetFiles(Folder.Failed, "refused-*.bin"));
        await using AsyncServiceScope scope = _factory.Services.CreateAsyncScope();
        Assert.Equal(0, (await scope.ServiceProvider.GetRequiredService<LotService>().GetSummaryAsync(lot)).Measurements);
    }

    [Fact]
    public async Task A_file_still_being_written_as_part_is_left_alone()
    {
        string lot = await Bench.PrepareLotAsync(_factory);
        string name = lot + "__S0004.s2p" + WatchFileName.PartSuffix;
        await File.WriteAllTextAsync(Path.Combine(_inbox, name), Bench.UnitTouchstone(4));
        Assert.Equal(0, await Folder.ScanOnceAsync());
        Assert.True(File.Exists(Path.Combine(_inbox, name)));
    }

    [Fact]
    public async Task A_file_is_taken_only_once_its_size_and_time_have_been_stable()
    {
        using var data = new TempFolder();
        var clock = new Microsoft.Extensions.Time.Testing.FakeTimeProvider(DateTimeOffset.UtcNow);
        string inbox = Path.Combine(data.Path, "inbox");
        Directory.CreateDirectory(inbox);
        using var factory = new WebFactory(Path.Combine(data.Path, "db"), new Dictionary<string, string?>
        {
            ["Stations:IQC-1:WatchFolder"] = inbox,
            ["Watch:StableSeconds"] = "2",
        }, clock);
        string lot = await Bench.PrepareLotAsync(factory);
        WatchFolderIngestor folder = factory.Services.GetRequiredService<WatchFolders>().For("IQC-1");
        await File.WriteAllTextAsync(Path.Combine(inbox, lot + "__S0005.s2p"), Bench.UnitTouchstone(5, DefectKind.None));
        Assert.Equal(0, await folder.ScanOnceAsync());
        clock.Advance(TimeSpan.FromSeconds(1));
        Assert.Equal(0, await folder.ScanOnceAsync());
        clock.Advance(TimeSpan.FromSeconds(1.5));
        Assert.Equal(1, await folder.ScanOnceAsync());
        Assert.Single(Directory.GetFiles(folder.Done));
    }
}
