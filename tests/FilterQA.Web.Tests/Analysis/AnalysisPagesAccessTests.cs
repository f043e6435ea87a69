using System.Net;
using FilterQA.Data.Accounts;
using FilterQA.Web.Tests.Infrastructure;

namespace FilterQA.Web.Tests.Analysis;

/// <summary>
/// Who may open the what-if, trends and audit pages, through the whole host: the page itself refuses a role it is not
/// for (the sign-in endpoint's access-denied redirect), not only the menu.
/// </summary>
public sealed class AnalysisPagesAccessTests : IDisposable
{
    private readonly TempFolder _data = new();
    private readonly WebFactory _factory;

    public AnalysisPagesAccessTests() => _factory = new WebFactory(_data.Path);

    public void Dispose()
    {
        _factory.Dispose();
        _data.Dispose();
    }

    [Theory]
    [InlineData(RoleNames.QualityEngineer, "/whatif", true)]
    [InlineData(RoleNames.Approver, "/whatif", true)]
    [InlineData(RoleNames.Administrator, "/whatif", false)]
    [InlineData(RoleNames.Operator, "/whatif", false)]
    [InlineData(RoleNames.QualityEngineer, "/trends", true)]
    [InlineData(RoleNames.Approver, "/trends", true)]
    [InlineData(RoleNames.Administrator, "/trends", true)]
    [InlineData(RoleNames.Operator, "/trends", false)]
    [InlineData(RoleNames.QualityEngineer, "/audit", true)]
    [InlineData(RoleNames.Approver, "/audit", true)]
    [InlineData(RoleNames.Administrator, "/audit", true)]
    [InlineData(RoleNames.Operator, "/audit", false)]
    public async Task Each_page_opens_for_its_roles_and_refuses_the_others(string role, string path, bool allowed)
    {
        await Bench.CreatePersonAsync(_factory, "someone", role);
        HttpClient client = await Bench.SignedInAsync(_factory, "someone");
        HttpResponseMessage page = await client.GetAsync(path);
        if (allowed)
        {
            Assert.Equal(HttpStatusCode.OK, page.StatusCode);
            string html = await page.Content.ReadAsStringAsync();
            Assert.Contains("<h1>", html, StringComparison.Ordinal);
        }
        else
        {
            Assert.Equal(HttpStatusCode.Redirect, page.StatusCode);
            Assert.StartsWith("/signin?error=", page.Headers.Location?.OriginalString, StringComparison.Ordinal);
        }
    }

    [Theory]
    [InlineData(RoleNames.QualityEngineer, true, true)]
    [InlineData(RoleNames.Approver, true, true)]
    [InlineData(RoleNames.Administrator, false, true)]
    [InlineData(RoleNames.Operator, false, false)]
    public async Task The_menu_links_the_pages_for_the_roles_that_may_open_them(string role, bool whatIf, bool analysis)
    {
        await Bench.CreatePersonAsync(_factory, "someone", role);
        HttpClient client = await Bench.SignedInAsync(_factory, "someone");
        string html = await (await client.GetAsync("/lots")).Content.ReadAsStringAsync();
        Assert.Equal(whatIf, html.Contains("href=\"whatif\"", StringComparison.Ordinal));
        Assert.Equal(analysis, html.Contains("href=\"trends\"", StringComparison.Ordinal));
        Assert.Equal(analysis, html.Contains("href=\"audit\"", StringComparison.Ordinal));
    }
}
