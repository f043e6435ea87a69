using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;
using FilterQA.Core.Templates.Text;
using FilterQA.Data.Services;
using FilterQA.Data.Tests.Infrastructure;

namespace FilterQA.Data.Tests.Storage;

/// <summary>
/// Saving a draft against the version it was loaded from (optimistic concurrency): a save from an older version is
/// refused with who saved in between and when, and nothing is stored. The limits used are the shipped TME-CF455-15
/// text's ("maximum: 6 dB" for the loss rule) changed by hand here.
/// </summary>
public abstract class DraftSaveContract : ProviderTestBase
{
    private static readonly Actor Other = new("u-mokafor", "M. Okafor");

    [StorageFact]
    public async Task A_save_from_a_stale_version_is_refused_naming_who_saved_in_between_and_when()
    {
        StoredTemplateText loaded = await RegisterDraftAsync("TME-CF455-15-D1");
        // Both engineers open version 1; the other saves first.
        StoredTemplateText theirs = await Store.Catalog.SaveDraftTextAsync(loaded.PartNumber, loaded.Revision, WithLossLimit(loaded.Text, 5.5),
            loaded.DraftVersion, Other);
        Assert.Equal(loaded.DraftVersion + 1, theirs.DraftVersion);
        DateTimeOffset theirTime = Store.Clock.GetUtcNow();
        Store.Clock.Advance(TimeSpan.FromMinutes(3));

        var refused = await Assert.ThrowsAsync<DraftConflictException>(() => Store.Catalog.SaveDraftTextAsync(
            loaded.PartNumber, loaded.Revision, WithLossLimit(loaded.Text, 7), loaded.DraftVersion, Samples.Engineer));

        Assert.Equal((Other.Name, theirTime, loaded.DraftVersion, theirs.DraftVersion), (refused.SavedBy, refused.SavedAt, refused.LoadedVersion, refused.StoredVersion));
        Assert.Contains(Other.Name, refused.Message, StringComparison.Ordinal);
        StoredTemplateText now = await Store.Catalog.LoadTextAsync(loaded.PartNumber, loaded.Revision);
        Assert.Equal(theirs.Text, now.Text);
        // Their limit, exactly as they typed it (5.5 dB is the double nearest 5.5; no arithmetic in between).
        Assert.Equal(5.5, LossLimit(now.Text));
    }

    [StorageFact]
    public async Task A_save_from_the_current_version_stores_the_text_and_moves_the_version_on()
    {
        StoredTemplateText loaded = await RegisterDraftAsync("TME-CF455-15-D2");
        StoredTemplateText saved = await Store.Catalog.SaveDraftTextAsync(loaded.PartNumber, loaded.Revision, WithLossLimit(loaded.Text, 5.5),
            loaded.DraftVersion, Samples.Engineer);
        StoredTemplateText again = await Store.Catalog.SaveDraftTextAsync(loaded.PartNumber, loaded.Revision, WithLossLimit(saved.Text, 5),
            saved.DraftVersion, Samples.Engineer);

        Assert.Equal((loaded.DraftVersion + 1, loaded.DraftVersion + 2), (saved.DraftVersion, again.DraftVersion));
        Assert.Equal(5.0, LossLimit((await Store.Catalog.LoadTextAsync(loaded.PartNumber, loaded.Revision)).Text));
        Assert.Equal(Samples.Engineer.Name, again.SavedBy);
    }

    [StorageFact]
    public async Task A_text_with_problems_is_refused_with_its_line_and_nothing_is_stored()
    {
        StoredTemplateText loaded = await RegisterDraftAsync("TME-CF455-15-D3");
        string broken = loaded.Text.Replace("maximum: 6 dB", "maximum: 6 parsecs", StringComparison.Ordinal);
        int expectedLine = broken[..broken.IndexOf("6 parsecs", StringComparison.Ordinal)].Count(c => c == '\n') + 1;

        var refused = await Assert.ThrowsAsync<TemplateTextException>(() =>
            Store.Catalog.SaveDraftTextAsync(loaded.PartNumber, loaded.Revision, broken, loaded.DraftVersion, Samples.Engineer));

        Assert.Contains(refused.Problems, p => p.Line == expectedLine);
        StoredTemplateText now = await Store.Catalog.LoadTextAsync(loaded.PartNumber, loaded.Revision);
        Assert.Equal((loaded.Text, loaded.DraftVersion), (now.Text, now.DraftVersion));
    }

    [StorageFact]
    public async Task Importing_a_file_with_problems_stores_nothing_and_a_valid_one_becomes_a_draft()
    {
        StoredTemplateText loaded = await RegisterDraftAsync("TME-CF455-15-D4");
        string next = loaded.Text.Replace("revision: 1", "revision: 2", StringComparison.Ordinal);
        string broken = next.Replace("maximum: 6 dB", "maximum: six dB", StringComparison.Ordinal);

        var refused = await Assert.ThrowsAsync<TemplateTextException>(() => Store.Catalog.ImportDraftAsync(loaded.PartNumber, broken, Samples.Engineer));
        Assert.All(refused.Problems, p => Assert.True(p.Line > 0));
        Assert.Single(await Store.Catalog.RevisionHistoryAsync(loaded.PartNumber));

        StoredTemplateText imported = await Store.Catalog.ImportDraftAsync(loaded.PartNumber, next, Samples.Engineer);
        Assert.Equal((2, TemplateStatus.Draft), (imported.Revision, imported.Status));
        Assert.Equal(2, (await Store.Catalog.RevisionHistoryAsync(loaded.PartNumber)).Count);
    }

    private async Task<StoredTemplateText> RegisterDraftAsync(string partNumber)
    {
        await Store.Catalog.RegisterAsync(Samples.Draft(partNumber, 1), Samples.Engineer);
        return await Store.Catalog.LoadTextAsync(partNumber, 1);
    }

    private static string WithLossLimit(string text, double maximumDb)
    {
        LimitTemplate template = LimitTemplateReader.Read(text).Template!;
        var loss = (InsertionLossRule)template.FindRule("loss")!;
        LimitTemplate changed = LimitTemplate.Create(template.PartNumber, template.Revision, template.Description, template.Device, template.NominalHz,
            template.Status, template.Author, template.ReleaseDate, template.Sweep, template.DecisionRule,
            template.Rules.Select(r => r.Id == "loss" ? new InsertionLossRule(loss.Id, loss.Title, maximumDb, loss.Measure, loss.At, loss.Uncertainty) : r));
        return LimitTemplateWriter.Write(changed);
    }

    private static double LossLimit(string text) => ((InsertionLossRule)LimitTemplateReader.Read(text).Template!.FindRule("loss")!).MaximumDb;
}
