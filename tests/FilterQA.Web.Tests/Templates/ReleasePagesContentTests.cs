using System.Net;
using System.Text;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;
using FilterQA.Core.Templates.Text;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using FilterQA.Web.Hosting;
using FilterQA.Web.Tests.Infrastructure;
using Microsoft.Extensions.DependencyInjection;

namespace FilterQA.Web.Tests.Templates;

/// <summary>
/// The difference and reference-unit pages show stored data, against the whole host: the shipped TME-CF455-15
/// revision 1 and a draft revision 2 whose loss limit is 4 dB instead of 6 dB, and two tested units.
/// </summary>
public sealed class ReleasePagesContentTests : IDisposable
{
    private readonly TempFolder _data = new();
    private readonly WebFactory _factory;

    public ReleasePagesContentTests() => _factory = new WebFactory(_data.Path);

    public void Dispose()
    {
        _factory.Dispose();
        _data.Dispose();
    }

    [Fact]
    public async Task The_difference_page_names_the_changed_loss_limit_in_words_with_both_values()
    {
        await SeedAsync();
        await Bench.CreatePersonAsync(_factory, "spetrova", RoleNames.Approver);
        HttpClient client = await Bench.SignedInAsync(_factory, "spetrova");

        string html = await client.GetStringAsync($"/templates/{Bench.Part}/diff?from=1&to=2");

        // The shipped file says "maximum: 6 dB" for rule "loss"; the draft says 4 dB.
        Assert.Contains("data-rule=\"loss\" data-change=\"Changed\"", html, StringComparison.Ordinal);
        Assert.Contains("CHANGED", html, StringComparison.Ordinal);
        // Scoped CSS adds an attribute to each element, hence the patterns.
        Assert.Matches("<td class=\"old\"[^>]*>6 dB</td>", html);
        Assert.Matches("<td class=\"new\"[^>]*>4 dB</td>", html);
        Assert.Contains("data-rule=\"ripple\" data-change=\"Unchanged\"", html, StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_difference_page_says_which_revisions_exist_when_asked_for_a_missing_one()
    {
        await SeedAsync();
        await Bench.CreatePersonAsync(_factory, "jlindqvist", RoleNames.QualityEngineer);
        HttpClient client = await Bench.SignedInAsync(_factory, "jlindqvist");

        string html = await client.GetStringAsync($"/templates/{Bench.Part}/diff?from=1&to=7");

        Assert.Contains("has no revision 7; it has 1, 2", html, StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_reference_units_page_lists_the_marked_unit_and_the_lots_to_add_from()
    {
        await SeedAsync(markFirst: true);
        await Bench.CreatePersonAsync(_factory, "jlindqvist", RoleNames.QualityEngineer);
        HttpClient client = await Bench.SignedInAsync(_factory, "jlindqvist");

        HttpResponseMessage page = await client.GetAsync($"/templates/{Bench.Part}/reference-units");

        Assert.Equal(HttpStatusCode.OK, page.StatusCode);
        string html = await page.Content.ReadAsStringAsync();
        Assert.Contains("data-serial=\"S0001\" data-lot=\"VP-2611-0921\"", html, StringComparison.Ordinal);
        Assert.DoesNotContain("data-serial=\"S0002\"", html, StringComparison.Ordinal);
        Assert.Contains("1 current reference unit(s)", html, StringComparison.Ordinal);
        Assert.Matches("<option value=\"VP-2611-0921\"[^>]*>VP-2611-0921</option>", html);
    }

    private async Task SeedAsync(bool markFirst = false)
    {
        await using AsyncServiceScope scope = _factory.Services.CreateAsyncScope();
        IServiceProvider services = scope.ServiceProvider;
        string root = RepositoryPaths.FindRoot(AppContext.BaseDirectory) ?? throw new InvalidOperationException("repository root not found");
        LimitTemplate released = LimitTemplateReader.ReadFile(Path.Combine(root, "limit-templates", Bench.Part + ".yaml")).Template!;
        TemplateCatalog catalog = services.GetRequiredService<TemplateCatalog>();
        await catalog.RegisterAsync(released, Bench.Engineer);
        await catalog.RegisterAsync(released.NewRevision(edit =>
        {
            for (int i = 0; i < edit.Rules.Count; i++)
            {
                if (edit.Rules[i] is InsertionLossRule loss)
                {
                    edit.Rules[i] = new InsertionLossRule(loss.Id, loss.Title, 4.0, loss.Measure, loss.At, loss.Uncertainty);
                }
            }
        }), Bench.Engineer);
        await services.GetRequiredService<StationRegistry>().RegisterStationAsync(Bench.Station, "bench 1", Bench.Engineer);
        await services.GetRequiredService<LotService>().CreateLotAsync(
            new NewLot("VP-2611-0921", Bench.Part, 1, "Veltrane Piezo", 2, PlanRequest.FullInspection()), Bench.Engineer);
        SweepIntake intake = services.GetRequiredService<SweepIntake>();
        for (int i = 1; i <= 2; i++)
        {
            string serial = $"S{i:D4}";
            IntakeResult result = await intake.SubmitAsync(new SweepSubmission("VP-2611-0921", serial, Bench.Station, new Actor("u-rhaldane", "R. Haldane"),
                Encoding.UTF8.GetBytes(Bench.UnitTouchstone(serialIndex: i)), serial + ".s2p"));
            if (markFirst && i == 1)
            {
                await services.GetRequiredService<ReferenceUnitService>().AddAsync(Bench.Part, result.Stored.MeasurementId, "known good", Bench.Engineer);
            }
        }
    }
}
