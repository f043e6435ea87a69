using System.Net;
using System.Net.Http.Json;
using System.Text;
using System.Text.Json;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using FilterQA.Web.Tests.Infrastructure;
using Microsoft.Extensions.DependencyInjection;

namespace FilterQA.Web.Tests.Api;

/// <summary>The intake API's contract: who may call it, what a sweep body may be, and what each mistake is answered.</summary>
public sealed class IntakeApiTests : IDisposable
{
    private readonly TempFolder _data = new();
    private readonly WebFactory _factory;

    public IntakeApiTests() => _factory = new WebFactory(_data.Path, new Dictionary<string, string?> { ["Intake:MaxSweepBytes"] = "400000" });

    public void Dispose()
    {
        _factory.Dispose();
        _data.Dispose();
    }

    [Fact]
    public async Task Health_answers_anonymously_with_status_ok_and_no_data()
    {
        HttpResponseMessage answer = await Bench.Client(_factory).GetAsync("/health");
        Assert.Equal(HttpStatusCode.OK, answer.StatusCode);
        Assert.Equal("""{"status":"ok"}""", await answer.Content.ReadAsStringAsync());
    }

    [Fact]
    public async Task The_storage_is_the_temp_data_folder_given_to_the_host()
    {
        await Bench.Client(_factory).GetAsync("/health");
        Assert.True(File.Exists(Path.Combine(_data.Path, "filterqa.db")), "the SQLite file is not in the configured data folder");
    }

    [Theory]
    [InlineData("POST", "/api/v1/lots/VP-2611-0042/units/S0001/sweeps?fileName=a.s2p")]
    [InlineData("GET", "/api/v1/lots/VP-2611-0042")]
    [InlineData("POST", "/api/v1/stations/IQC-1/api-keys")]
    [InlineData("GET", "/api/v1/stations/IQC-1/api-keys")]
    [InlineData("DELETE", "/api/v1/stations/IQC-1/api-keys/1")]
    public async Task Every_endpoint_answers_an_anonymous_caller_401_problem_details(string method, string url)
    {
        var request = new HttpRequestMessage(new HttpMethod(method), url);
        if (method == "POST")
        {
            request.Content = Bench.Text("{}", "application/json");
        }
        HttpResponseMessage answer = await Bench.Client(_factory).SendAsync(request);
        Assert.Equal(HttpStatusCode.Unauthorized, answer.StatusCode);
        Assert.Equal("application/problem+json", answer.Content.Headers.ContentType?.MediaType);
    }

    [Fact]
    public async Task An_anonymous_page_request_is_redirected_to_sign_in()
    {
        HttpResponseMessage answer = await Bench.Client(_factory).GetAsync("/");
        Assert.Equal(HttpStatusCode.Redirect, answer.StatusCode);
        Assert.StartsWith("/signin?returnUrl=%2F", answer.Headers.Location!.PathAndQuery, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Static_files_and_the_sign_in_page_answer_anonymously()
    {
        HttpClient client = Bench.Client(_factory);
        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync("/app.css")).StatusCode);
        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync("/signin")).StatusCode);
    }

    [Fact]
    public async Task An_unknown_or_revoked_key_is_answered_401()
    {
        string lot = await Bench.PrepareLotAsync(_factory);
        HttpClient client = Bench.Client(_factory);
        var unknown = new HttpRequestMessage(HttpMethod.Get, $"/api/v1/lots/{lot}");
        unknown.Headers.Add("X-Api-Key", "fqa_not-a-key");
        Assert.Equal(HttpStatusCode.Unauthorized, (await client.SendAsync(unknown)).StatusCode);

        string key = await Bench.StationKeyAsync(_factory);
        await using (AsyncServiceScope scope = _factory.Services.CreateAsyncScope())
        {
            StationApiKeys keys = scope.ServiceProvider.GetRequiredService<StationApiKeys>();
            StationApiKeyInfo info = (await keys.ListAsync(Bench.Station)).Single();
            await keys.RevokeAsync(Bench.Station, info.Id, Bench.Engineer);
        }
        var revoked = new HttpRequestMessage(HttpMethod.Get, $"/api/v1/lots/{lot}");
        revoked.Headers.Add("X-Api-Key", key);
        HttpResponseMessage answer = await client.SendAsync(revoked);
        Assert.Equal(HttpStatusCode.Unauthorized, answer.StatusCode);
        Assert.Contains("revoked", await answer.Content.ReadAsStringAsync(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_station_key_reads_a_lot_but_may_not_make_keys_or_open_pages()
    {
        string lot = await Bench.PrepareLotAsync(_factory);
        string key = await Bench.StationKeyAsync(_factory);
        HttpClient client = Bench.Client(_factory);
        client.DefaultRequestHeaders.Add("X-Api-Key", key);

        HttpResponseMessage read = await client.GetAsync($"/api/v1/lots/{lot}");
        Assert.Equal(HttpStatusCode.OK, read.StatusCode);
        using JsonDocument summary = JsonDocument.Parse(await read.Content.ReadAsStringAsync());
        Assert.Equal(lot, summary.RootElement.GetProperty("lotNumber").GetString());

        HttpResponseMessage makeKey = await client.PostAsJsonAsync($"/api/v1/stations/{Bench.Station}/api-keys", new { label = "x" });
        Assert.Equal(HttpStatusCode.Forbidden, makeKey.StatusCode);
        Assert.NotEqual(HttpStatusCode.OK, (await client.GetAsync("/")).StatusCode);
    }

    [Fact]
    public async Task An_operator_may_not_make_keys_and_cannot_post_sweeps_without_a_station_key()
    {
        string lot = await Bench.PrepareLotAsync(_factory);
        await Bench.CreatePersonAsync(_factory, "rhaldane", RoleNames.Operator);
        HttpClient client = await Bench.SignedInAsync(_factory, "rhaldane");

        HttpResponseMessage makeKey = await client.PostAsJsonAsync($"/api/v1/stations/{Bench.Station}/api-keys", new { label = "x" });
        Assert.Equal(HttpStatusCode.Forbidden, makeKey.StatusCode);
        Assert.Equal("application/problem+json", makeKey.Content.Headers.ContentType?.MediaType);

        HttpResponseMessage post = await client.PostAsync($"/api/v1/lots/{lot}/units/S0001/sweeps?fileName=unit.s2p", Bench.Text(Bench.UnitTouchstone()));
        Assert.Equal(HttpStatusCode.Forbidden, post.StatusCode);
        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync($"/api/v1/lots/{lot}")).StatusCode);
    }

    [Fact]
    public async Task An_administrator_makes_a_key_shown_once_that_then_posts_a_sweep()
    {
        string lot = await Bench.PrepareLotAsync(_factory);
        await Bench.CreatePersonAsync(_factory, "boss", RoleNames.Administrator);
        HttpClient admin = await Bench.SignedInAsync(_factory, "boss");

        HttpResponseMessage made = await admin.PostAsJsonAsync($"/api/v1/stations/{Bench.Station}/api-keys", new { label = "VNA script" });
        Assert.Equal(HttpStatusCode.Created, made.StatusCode);
        using JsonDocument created = JsonDocument.Parse(await made.Content.ReadAsStringAsync());
        string key = created.RootElement.GetProperty("key").GetString()!;
        Assert.StartsWith(StationApiKeys.KeyStart, key, StringComparison.Ordinal);

        string listed = await admin.GetStringAsync($"/api/v1/stations/{Bench.Station}/api-keys");
        Assert.DoesNotContain(key, listed, StringComparison.Ordinal);

        HttpResponseMessage post = await Bench.Client(_factory).SendAsync(Bench.SweepPost(lot, "S0001", key, Bench.Text(Bench.UnitTouchstone())));
        string body = await post.Content.ReadAsStringAsync();
        Assert.True(post.StatusCode == HttpStatusCode.Created, body);
        using JsonDocument answer = JsonDocument.Parse(body);
        Assert.Equal("S0001", answer.RootElement.GetProperty("serial").GetString());
        Assert.Equal(Bench.Station, answer.RootElement.GetProperty("station").GetString());
        Assert.True(answer.RootElement.GetProperty("rules").GetArrayLength() > 0);
        JsonElement firstRule = answer.RootElement.GetProperty("rules")[0];
        foreach (string field in new[] { "ruleId", "outcome", "measured", "limit", "margin", "unit", "message" })
        {
            Assert.True(firstRule.TryGetProperty(field, out _), $"a rule result has no '{field}'");
        }
        Assert.Equal(1, answer.RootElement.GetProperty("lot").GetProperty("unitsTested").GetInt32());
    }

    [Fact]
    public async Task The_same_idempotency_key_twice_stores_one_unit_and_gives_the_same_answer()
    {
        string lot = await Bench.PrepareLotAsync(_factory);
        string key = await Bench.StationKeyAsync(_factory);
        HttpClient client = Bench.Client(_factory);
        string sweep = Bench.UnitTouchstone();

        async Task<(HttpStatusCode, string)> PostAsync(string text, string serial)
        {
            HttpRequestMessage request = Bench.SweepPost(lot, serial, key, Bench.Text(text));
            request.Headers.Add("Idempotency-Key", "retry-7");
            HttpResponseMessage answer = await client.SendAsync(request);
            return (answer.StatusCode, await answer.Content.ReadAsStringAsync());
        }

        (HttpStatusCode firstStatus, string firstBody) = await PostAsync(sweep, "S0001");
        (HttpStatusCode secondStatus, string secondBody) = await PostAsync(sweep, "S0001");
        Assert.Equal(HttpStatusCode.Created, firstStatus);
        Assert.Equal(firstStatus, secondStatus);
        Assert.Equal(firstBody, secondBody);
        await using (AsyncServiceScope scope = _factory.Services.CreateAsyncScope())
        {
            LotSummary summary = await scope.ServiceProvider.GetRequiredService<LotService>().GetSummaryAsync(lot);
            Assert.Equal(1, summary.UnitsTested);
            Assert.Equal(1, summary.Measurements);
        }

        (HttpStatusCode reused, string reusedBody) = await PostAsync(Bench.UnitTouchstone(2), "S0002");
        Assert.Equal(HttpStatusCode.UnprocessableEntity, reused);
        Assert.Contains("Idempotency-Key", reusedBody, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_garbage_body_is_answered_422_naming_the_file_and_line_and_stores_nothing()
    {
        string lot = await Bench.PrepareLotAsync(_factory);
        string key = await Bench.StationKeyAsync(_factory);
        HttpResponseMessage answer = await Bench.Client(_factory).SendAsync(Bench.SweepPost(lot, "S0001", key,
            Bench.Text("# Hz S DB R 50\n100 this is not a number\n"), "?fileName=junk.s2p"));
        Assert.Equal(HttpStatusCode.UnprocessableEntity, answer.StatusCode);
        using JsonDocument problem = JsonDocument.Parse(await answer.Content.ReadAsStringAsync());
        Assert.Equal("junk.s2p", problem.RootElement.GetProperty("fileName").GetString());
        // The bad number is on line 2 of the body written above.
        Assert.Equal(2, problem.RootElement.GetProperty("line").GetInt32());
        await AssertNothingStoredAsync(lot);
    }

    [Fact]
    public async Task A_truncated_touchstone_is_answered_422_naming_a_line_of_the_body()
    {
        string lot = await Bench.PrepareLotAsync(_factory);
        string key = await Bench.StationKeyAsync(_factory);
        string whole = Bench.UnitTouchstone();
        string[] lines = whole.Split('\n');
        // Keep the header and 40 data lines, then half of the next line: the point is cut within its numbers.
        int header = Array.FindIndex(lines, l => l.StartsWith('#')) + 1;
        string cut = string.Join('\n', lines[..(header + 40)]) + "\n" + lines[header + 40][..(lines[header + 40].Length / 2)].TrimEnd() + "\n";
        int lastLine = header + 41;
        HttpResponseMessage answer = await Bench.Client(_factory).SendAsync(Bench.SweepPost(lot, "S0001", key, Bench.Text(cut)));
        Assert.Equal(HttpStatusCode.UnprocessableEntity, answer.StatusCode);
        using JsonDocument problem = JsonDocument.Parse(await answer.Content.ReadAsStringAsync());
        int line = problem.RootElement.GetProperty("line").GetInt32();
        Assert.InRange(line, lastLine, lastLine + 1);
        Assert.False(string.IsNullOrWhiteSpace(problem.RootElement.GetProperty("problem").GetString()));
        await AssertNothingStoredAsync(lot);
    }

    [Theory]
    [InlineData("application/xml")]
    [InlineData("multipart/form-data")]
    public async Task A_wrong_content_type_is_answered_415(string mediaType)
    {
        string lot = await Bench.PrepareLotAsync(_factory);
        string key = await Bench.StationKeyAsync(_factory);
        HttpResponseMessage answer = await Bench.Client(_factory).SendAsync(Bench.SweepPost(lot, "S0001", key, Bench.Text("x", mediaType)));
        Assert.Equal(HttpStatusCode.UnsupportedMediaType, answer.StatusCode);
    }

    [Fact]
    public async Task A_body_over_the_configured_limit_is_answered_413()
    {
        string lot = await Bench.PrepareLotAsync(_factory);
        string key = await Bench.StationKeyAsync(_factory);
        var big = new ByteArrayContent(new byte[400_001]);
        big.Headers.ContentType = new("application/octet-stream");
        HttpResponseMessage answer = await Bench.Client(_factory).SendAsync(Bench.SweepPost(lot, "S0001", key, big));
        Assert.Equal(HttpStatusCode.RequestEntityTooLarge, answer.StatusCode);
        await AssertNothingStoredAsync(lot);
    }

    [Fact]
    public async Task An_unknown_lot_is_answered_404()
    {
        await Bench.PrepareLotAsync(_factory);
        string key = await Bench.StationKeyAsync(_factory);
        HttpResponseMessage answer = await Bench.Client(_factory).SendAsync(Bench.SweepPost("VP-2611-9999", "S0001", key, Bench.Text(Bench.UnitTouchstone())));
        Assert.Equal(HttpStatusCode.NotFound, answer.StatusCode);
        Assert.Contains("VP-2611-9999", await answer.Content.ReadAsStringAsync(), StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("?fileName=../etc/unit.s2p")]
    [InlineData("?fileName=unit.exe")]
    [InlineData("")]
    public async Task A_missing_or_unsafe_file_name_is_answered_422(string query)
    {
        string lot = await Bench.PrepareLotAsync(_factory);
        string key = await Bench.StationKeyAsync(_factory);
        HttpResponseMessage answer = await Bench.Client(_factory).SendAsync(Bench.SweepPost(lot, "S0001", key, Bench.Text(Bench.UnitTouchstone()), query));
        Assert.Equal(HttpStatusCode.UnprocessableEntity, answer.StatusCode);
        Assert.Contains("fileName", await answer.Content.ReadAsStringAsync(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_json_body_with_touchstone_text_or_gain_arrays_is_stored()
    {
        string lot = await Bench.PrepareLotAsync(_factory);
        string key = await Bench.StationKeyAsync(_factory);
        HttpClient client = Bench.Client(_factory);
        string touchstone = JsonSerializer.Serialize(new { fileName = "unit.s2p", touchstone = Bench.UnitTouchstone() });
        HttpResponseMessage first = await client.SendAsync(Bench.SweepPost(lot, "S0001", key, Bench.Text(touchstone, "application/json"), null));
        Assert.True(first.StatusCode == HttpStatusCode.Created, await first.Content.ReadAsStringAsync());

        // Gain arrays: a simple bandpass-like shape over the template's span; only the conversion is checked here.
        double[] hz = Enumerable.Range(0, 801).Select(i => 255e3 + i * 500.0).ToArray();
        double[] gain = hz.Select(f => -5 - 60 * (1 - Math.Exp(-Math.Pow((f - 455e3) / 12e3, 2)))).ToArray();
        string arrays = JsonSerializer.Serialize(new { fileName = "unit2.json", frequencyHz = hz, gainDb = gain });
        HttpResponseMessage second = await client.SendAsync(Bench.SweepPost(lot, "S0002", key, Bench.Text(arrays, "application/json"), null));
        Assert.True(second.StatusCode == HttpStatusCode.Created, await second.Content.ReadAsStringAsync());

        string decreasing = JsonSerializer.Serialize(new { fileName = "bad.json", frequencyHz = new[] { 2.0, 1.0 }, gainDb = new[] { 0.0, 0.0 } });
        HttpResponseMessage bad = await client.SendAsync(Bench.SweepPost(lot, "S0003", key, Bench.Text(decreasing, "application/json"), null));
        Assert.Equal(HttpStatusCode.UnprocessableEntity, bad.StatusCode);
    }

    [Fact]
    public async Task The_openapi_document_is_served_and_lists_the_sweep_post()
    {
        Assert.NotEqual(HttpStatusCode.OK, (await Bench.Client(_factory).GetAsync("/openapi/v1.json")).StatusCode);
        await Bench.CreatePersonAsync(_factory, "apireader", RoleNames.Operator);
        HttpResponseMessage answer = await (await Bench.SignedInAsync(_factory, "apireader")).GetAsync("/openapi/v1.json");
        Assert.Equal(HttpStatusCode.OK, answer.StatusCode);
        using JsonDocument document = JsonDocument.Parse(await answer.Content.ReadAsStringAsync());
        JsonElement path = document.RootElement.GetProperty("paths").GetProperty("/api/v1/lots/{lotNumber}/units/{serial}/sweeps");
        Assert.True(path.TryGetProperty("post", out JsonElement post));
        Assert.True(post.GetProperty("responses").TryGetProperty("201", out _));
        Assert.True(post.GetProperty("responses").TryGetProperty("422", out _));
    }

    private async Task AssertNothingStoredAsync(string lot)
    {
        await using AsyncServiceScope scope = _factory.Services.CreateAsyncScope();
        LotSummary summary = await scope.ServiceProvider.GetRequiredService<LotService>().GetSummaryAsync(lot);
        Assert.Equal(0, summary.Measurements);
    }
}
