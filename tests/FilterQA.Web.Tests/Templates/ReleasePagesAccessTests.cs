using System.Net;
using FilterQA.Data.Accounts;
using FilterQA.Web.Tests.Infrastructure;

namespace FilterQA.Web.Tests.Templates;

/// <summary>
/// Who may open the release, difference and reference-unit pages, against the whole host: the pages refuse a role
/// they are not for (the sign-in page with a reason), whatever links are shown.
/// </summary>
public sealed class ReleasePagesAccessTests : IDisposable
{
    private const string Release = "/templates/TME-CF455-15/2/release";
    private const string ReferenceUnits = "/templates/TME-CF455-15/reference-units";
    private const string Diff = "/templates/TME-CF455-15/diff?from=1&to=2";

    private readonly TempFolder _data = new();
    private readonly WebFactory _factory;

    public ReleasePagesAccessTests() => _factory = new WebFactory(_data.Path);

    public void Dispose()
    {
        _factory.Dispose();
        _data.Dispose();
    }

    public static TheoryData<string, string> Refused => new()
    {
        { Release, RoleNames.Operator },
        { Release, RoleNames.Approver },
        { Release, RoleNames.Administrator },
        { ReferenceUnits, RoleNames.Operator },
        { ReferenceUnits, RoleNames.Approver },
        { ReferenceUnits, RoleNames.Administrator },
        { Diff, RoleNames.Operator },
    };

    public static TheoryData<string, string> Opened => new()
    {
        { Release, RoleNames.QualityEngineer },
        { ReferenceUnits, RoleNames.QualityEngineer },
        { Diff, RoleNames.QualityEngineer },
        { Diff, RoleNames.Approver },
        { Diff, RoleNames.Administrator },
    };

    [Theory]
    [MemberData(nameof(Refused))]
    public async Task The_page_refuses_a_role_it_is_not_for(string url, string role)
    {
        await Bench.CreatePersonAsync(_factory, "someone", role);
        HttpClient client = await Bench.SignedInAsync(_factory, "someone");

        HttpResponseMessage page = await client.GetAsync(url);

        Assert.Equal(HttpStatusCode.Redirect, page.StatusCode);
        Assert.StartsWith("/signin?error=", page.Headers.Location?.OriginalString, StringComparison.Ordinal);
    }

    [Theory]
    [MemberData(nameof(Opened))]
    public async Task The_page_opens_for_its_roles_and_says_clearly_when_the_part_is_not_registered(string url, string role)
    {
        await Bench.CreatePersonAsync(_factory, "someone", role);
        HttpClient client = await Bench.SignedInAsync(_factory, "someone");

        HttpResponseMessage page = await client.GetAsync(url);

        Assert.Equal(HttpStatusCode.OK, page.StatusCode);
        string html = await page.Content.ReadAsStringAsync();
        Assert.Contains("TME-CF455-15", html, StringComparison.Ordinal);
        Assert.Contains("is not registered", html, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(Release)]
    [InlineData(ReferenceUnits)]
    [InlineData(Diff)]
    public async Task Someone_not_signed_in_is_sent_to_sign_in(string url)
    {
        HttpResponseMessage page = await Bench.Client(_factory).GetAsync(url);

        Assert.Equal(HttpStatusCode.Redirect, page.StatusCode);
        Assert.StartsWith("http://localhost/signin", page.Headers.Location?.OriginalString, StringComparison.Ordinal);
    }
}
