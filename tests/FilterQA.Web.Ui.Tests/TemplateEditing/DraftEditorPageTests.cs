using System.Security.Claims;
using Bunit;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;
using FilterQA.Core.Templates.Text;
using FilterQA.Data.Accounts;
using FilterQA.Data.Hosting;
using FilterQA.Data.Services;
using FilterQA.Web.Ui.Pages;
using FilterQA.Web.Ui.Tests.Infrastructure;
using Microsoft.Extensions.DependencyInjection;

namespace FilterQA.Web.Ui.Tests.TemplateEditing;

/// <summary>
/// The draft editor's form and text kept in step. Expected values come from the shipped template text
/// (limit-templates/TME-CF455-15.yaml: "maximum: 6 dB" for the loss rule) and from SI prefixes (k = 1e3, M = 1e6,
/// SI Brochure, 9th edition, table 7), never from the editor.
/// </summary>
public sealed class DraftEditorPageTests : SeededStore
{
    private const int DraftRevision = 2;
    private const string LossRule = "fieldset[data-rule-kind='insertion-loss']";

    public DraftEditorPageTests()
    {
        var auth = AddAuthorization();
        auth.SetAuthorized("J. Lindqvist");
        auth.SetRoles(RoleNames.QualityEngineer);
        auth.SetClaims(new Claim(ClaimTypes.NameIdentifier, "u-jlindqvist"));
    }

    [Fact]
    public async Task Editing_a_rule_in_the_form_rewrites_the_text()
    {
        IRenderedComponent<DraftEditor> cut = await OpenAsync();
        cut.Find($"{LossRule} [data-key='maximum'] input").Input("5.5");

        LimitTemplate read = ReadText(cut);
        var loss = Assert.IsType<InsertionLossRule>(read.FindRule("loss"));
        // 5.5 dB typed in a dB field: exactly the double nearest 5.5.
        Assert.Equal(5.5, loss.MaximumDb);
        Assert.Contains("maximum: 5.5 dB", TextOf(cut), StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("455", "kHz", 455e3)]
    [InlineData("0.455", "MHz", 455e3)]
    [InlineData("455000", "Hz", 455e3)]
    public async Task A_frequency_typed_with_its_unit_is_converted_to_hertz_in_the_text(string number, string unit, double expectedHz)
    {
        IRenderedComponent<DraftEditor> cut = await OpenAsync();
        cut.Find("[data-key='nominal'] select.tf-unit").Change(unit);
        cut.Find("[data-key='nominal'] input").Input(number);

        // Decimal scaling by the SI prefix is exact, so the value read back is the double nearest the product: no tolerance.
        Assert.Equal(expectedHz, ReadText(cut).NominalHz);
        if (unit != "Hz")
        {
            Assert.Equal("= 455000 Hz", cut.Find("[data-key='nominal'] .tf-si").TextContent);
        }
    }

    [Fact]
    public async Task Editing_the_text_refreshes_the_form()
    {
        IRenderedComponent<DraftEditor> cut = await OpenAsync();
        string text = TextOf(cut);
        int at = LossMaximumIndex(text);
        cut.Find("#template-text").Input(text[..at] + "maximum: 7.25 dB" + text[(at + "maximum: 6 dB".Length)..]);

        Assert.Equal("7.25", cut.Find($"{LossRule} [data-key='maximum'] input").GetAttribute("value"));
        Assert.Empty(cut.FindAll(".text-problems li"));
    }

    [Fact]
    public async Task Text_that_does_not_read_keeps_the_last_good_form_and_storage_and_names_its_line()
    {
        IRenderedComponent<DraftEditor> cut = await OpenAsync();
        string stored = await StoredTextAsync();
        string text = TextOf(cut);
        int at = LossMaximumIndex(text);
        string broken = text[..at] + "maximum: 6 parsecs" + text[(at + "maximum: 6 dB".Length)..];
        // The line is counted in the text itself: one more than the line breaks before the edit.
        int expectedLine = text[..at].Count(c => c == '\n') + 1;

        cut.Find("#template-text").Input(broken);

        var problem = Assert.Single(cut.FindAll(".text-problems li"));
        Assert.Equal(expectedLine.ToString(System.Globalization.CultureInfo.InvariantCulture), problem.GetAttribute("data-line"));
        Assert.Contains("parsecs", problem.TextContent, StringComparison.Ordinal);
        Assert.Equal("6", cut.Find($"{LossRule} [data-key='maximum'] input").GetAttribute("value"));
        Assert.True(cut.Find("#save-draft").HasAttribute("disabled"));
        Assert.Equal(stored, await StoredTextAsync());
    }

    [Theory]
    [InlineData("6,5", "decimal separator as a point")]
    [InlineData("-1", "more than zero")]
    [InlineData("six", "not a number")]
    [InlineData("", "is needed")]
    public async Task A_bad_value_is_shown_against_its_field_and_the_text_keeps_the_line(string typed, string phrase)
    {
        IRenderedComponent<DraftEditor> cut = await OpenAsync();
        cut.Find($"{LossRule} [data-key='maximum'] input").Input(typed);

        var field = cut.Find($"{LossRule} [data-key='maximum']");
        Assert.Contains("has-problem", field.ClassName, StringComparison.Ordinal);
        Assert.Contains(phrase, field.QuerySelector(".tf-problems")!.TextContent, StringComparison.Ordinal);
        Assert.True(cut.Find("#save-draft").HasAttribute("disabled"));
    }

    [Fact]
    public async Task A_problem_the_reader_finds_in_the_form_lands_on_its_field()
    {
        IRenderedComponent<DraftEditor> cut = await OpenAsync();
        // Two rules with the same id: the reader reports the second id (limit-templates/README.md: ids are unique).
        cut.Find("fieldset[data-rule-kind='passband-ripple'] [data-key='id'] input").Input("loss");

        var field = cut.Find("fieldset[data-rule-kind='passband-ripple'] [data-key='id']");
        Assert.Contains("earlier rule", field.QuerySelector(".tf-problems")!.TextContent, StringComparison.Ordinal);
        Assert.NotEmpty(cut.FindAll(".text-problems li"));
    }

    private async Task<IRenderedComponent<DraftEditor>> OpenAsync()
    {
        await SeedAsync();
        LimitTemplate shipped = LimitTemplateReader.ReadFile(RepositoryFiles.Template(PartNumber)).Template!;
        LimitTemplate draft = LimitTemplate.Create(PartNumber, DraftRevision, shipped.Description, shipped.Device, shipped.NominalHz, TemplateStatus.Draft,
            null, null, shipped.Sweep, shipped.DecisionRule, shipped.Rules);
        await Services.GetRequiredService<TemplateCatalog>().RegisterAsync(draft, Engineer);
        IRenderedComponent<DraftEditor> cut = Render<DraftEditor>(p => p.Add(x => x.PartNumber, PartNumber).Add(x => x.Revision, DraftRevision));
        cut.WaitForElement("#template-text", TimeSpan.FromSeconds(10));
        return cut;
    }

    private async Task<string> StoredTextAsync() =>
        (await Services.GetRequiredService<TemplateCatalog>().LoadTextAsync(PartNumber, DraftRevision)).Text;

    private static string TextOf(IRenderedComponent<DraftEditor> cut) => cut.Find("#template-text").GetAttribute("value") ?? cut.Find("#template-text").TextContent;

    private static LimitTemplate ReadText(IRenderedComponent<DraftEditor> cut)
    {
        TemplateReadResult read = LimitTemplateReader.Read(TextOf(cut));
        Assert.True(read.Succeeded, string.Join("; ", read.Problems));
        return read.Template!;
    }

    /// <summary>Where the loss rule's "maximum: 6 dB" line is (the loss rule is the one with "measure:").</summary>
    private static int LossMaximumIndex(string text)
    {
        int measure = text.IndexOf("measure: minimum-loss", StringComparison.Ordinal);
        Assert.True(measure > 0, "the draft has the shipped loss rule");
        int at = text.IndexOf("maximum: 6 dB", measure, StringComparison.Ordinal);
        Assert.True(at > 0, "the loss rule's maximum is 6 dB in the shipped text");
        return at;
    }
}
