using System.Net;
using System.Text;
using System.Text.RegularExpressions;
using FilterQA.Core.Formats.Touchstone;
using FilterQA.Core.Sampling;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Synthesis;
using FilterQA.Core.Templates.Text;
using FilterQA.Data;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using FilterQA.Web.Hosting;
using Microsoft.AspNetCore.Identity;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Extensions.DependencyInjection;

namespace FilterQA.Web.Tests.Infrastructure;

/// <summary>Ready-made records and requests for the host tests (invented scenario names).</summary>
public static partial class Bench
{
    public const string Station = "IQC-1";
    public const string Part = "TME-CF455-15";
    public const string Password = "Bench-Pass-2611";

    public static readonly Actor Engineer = new("u-test-engineer", "J. Lindqvist");

    /// <summary>Registers the shipped 455 kHz template, station IQC-1 and a lot of 500 (level II, normal, AQL 0.65).</summary>
    public static async Task<string> PrepareLotAsync(WebFactory factory, string? lotNumber = null)
    {
        lotNumber ??= "VP-2611-" + Guid.NewGuid().ToString("N")[..6].ToUpperInvariant();
        await using AsyncServiceScope scope = factory.Services.CreateAsyncScope();
        IServiceProvider services = scope.ServiceProvider;
        string? root = RepositoryPaths.FindRoot(AppContext.BaseDirectory) ?? throw new InvalidOperationException("repository root not found");
        TemplateReadResult read = LimitTemplateReader.ReadFile(Path.Combine(root, "limit-templates", Part + ".yaml"));
        await services.GetRequiredService<TemplateCatalog>().RegisterAsync(read.Template!, Engineer);
        await services.GetRequiredService<StationRegistry>().RegisterStationAsync(Station, "bench 1", Engineer);
        await services.GetRequiredService<LotService>().CreateLotAsync(new NewLot(lotNumber, Part, null, "Veltrane Piezo", 500,
            PlanRequest.Mil105E(InspectionLevel.II, 0.65, InspectionSeverity.Normal)), Engineer);
        return lotNumber;
    }

    public static async Task<string> StationKeyAsync(WebFactory factory, string station = Station)
    {
        await using AsyncServiceScope scope = factory.Services.CreateAsyncScope();
        await scope.ServiceProvider.GetRequiredService<StationRegistry>().RegisterStationAsync(station, "bench", Engineer);
        NewStationApiKey key = await scope.ServiceProvider.GetRequiredService<StationApiKeys>().CreateAsync(station, "test script", Engineer);
        return key.Key;
    }

    /// <summary>An account with <see cref="Password"/>, and a badge and PIN when given.</summary>
    public static async Task CreatePersonAsync(WebFactory factory, string userName, string role, string? badge = null, string? pin = null)
    {
        await using AsyncServiceScope scope = factory.Services.CreateAsyncScope();
        UserManager<FilterQaUser> users = scope.ServiceProvider.GetRequiredService<UserManager<FilterQaUser>>();
        var user = new FilterQaUser { UserName = userName, DisplayName = "Test " + userName, BadgeNumber = badge ?? "" };
        if (pin is not null)
        {
            user.PinHash = scope.ServiceProvider.GetRequiredService<IPasswordHasher<FilterQaUser>>().HashPassword(user, pin);
        }
        IdentityResult created = await users.CreateAsync(user, Password);
        Assert.True(created.Succeeded, string.Join("; ", created.Errors.Select(e => e.Description)));
        Assert.True((await users.AddToRoleAsync(user, role)).Succeeded);
    }

    public static HttpClient Client(WebFactory factory) =>
        factory.CreateClient(new WebApplicationFactoryClientOptions { AllowAutoRedirect = false, HandleCookies = true });

    /// <summary>A client signed in with the user name and <see cref="Password"/> through the sign-in form and endpoint.</summary>
    public static async Task<HttpClient> SignedInAsync(WebFactory factory, string userName)
    {
        HttpClient client = Client(factory);
        HttpResponseMessage answer = await PostSignInAsync(client, new() { ["userName"] = userName, ["password"] = Password, ["returnUrl"] = "/" });
        Assert.Equal(HttpStatusCode.Redirect, answer.StatusCode);
        Assert.Equal("/", answer.Headers.Location?.OriginalString);
        return client;
    }

    /// <summary>GETs the sign-in form for its antiforgery token and posts <paramref name="fields"/> with it.</summary>
    public static async Task<HttpResponseMessage> PostSignInAsync(HttpClient client, Dictionary<string, string> fields)
    {
        string form = await client.GetStringAsync("/signin");
        Match token = TokenField().Match(form);
        Assert.True(token.Success, "the sign-in form carries no antiforgery token");
        fields["__RequestVerificationToken"] = WebUtility.HtmlDecode(token.Groups[1].Value);
        return await client.PostAsync("/account/sign-in", new FormUrlEncodedContent(fields));
    }

    /// <summary>A synthetic demo unit of the 455 kHz filter as Touchstone text (demo data, not reference data).</summary>
    public static string UnitTouchstone(int serialIndex = 1, DefectKind defect = DefectKind.None)
    {
        Sweep unit = new UnitSynthesiser(7).Unit(DemoParts.Get(Part), serialIndex, defect);
        return TouchstoneWriter.WriteToString(unit, new TouchstoneWriteOptions { FrequencyUnit = FrequencyUnit.Hz, DataFormat = TouchstoneDataFormat.DecibelAngle });
    }

    public static HttpRequestMessage SweepPost(string lotNumber, string serial, string key, HttpContent content, string? query = "?fileName=unit.s2p")
    {
        var request = new HttpRequestMessage(HttpMethod.Post, $"/api/v1/lots/{lotNumber}/units/{serial}/sweeps{query}") { Content = content };
        request.Headers.Add("X-Api-Key", key);
        return request;
    }

    public static StringContent Text(string text, string mediaType = "text/plain") => new(text, Encoding.UTF8, mediaType);

    [GeneratedRegex("name=\"__RequestVerificationToken\" value=\"([^\"]+)\"")]
    private static partial Regex TokenField();
}
