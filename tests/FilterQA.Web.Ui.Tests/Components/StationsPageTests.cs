using Bunit;
using FilterQA.Core.Formats.Delimited;
using FilterQA.Core.Synthesis;
using FilterQA.Data.Services;
using FilterQA.Web.Ui.Pages;
using FilterQA.Web.Ui.Tests.Infrastructure;
using Microsoft.AspNetCore.Components.Forms;
using Microsoft.Extensions.DependencyInjection;

namespace FilterQA.Web.Ui.Tests.Components;

public sealed class StationsPageTests : SeededStore
{
    [Fact]
    public async Task A_thru_file_given_on_the_page_becomes_the_stations_latest_thru()
    {
        await SeedAsync();
        var cut = Render<Stations>();
        cut.WaitForElement("tr[data-station]", TimeSpan.FromSeconds(10));
        Assert.Contains("No thru recorded", cut.Find("tr[data-station]").TextContent, StringComparison.Ordinal);

        using var text = new StringWriter();
        DelimitedTextWriter.Write(new UnitSynthesiser(7).PowerThru(DemoParts.Get(PartNumber), Station), text);
        cut.FindComponent<InputFile>().UploadFiles(InputFileContent.CreateFromText(text.ToString(), "IQC-1_thru.csv"));
        cut.WaitForElement("p.done", TimeSpan.FromSeconds(20));

        ThruInfo? thru = await Services.GetRequiredService<StationRegistry>().LatestThruAsync(Station);
        Assert.NotNull(thru);
        Assert.Equal("IQC-1_thru.csv", thru.FileName);
        Assert.Contains("IQC-1_thru.csv", cut.Find("tr[data-station]").TextContent, StringComparison.Ordinal);
        // The page holds the stored flatness against its stated limit and says which side it is on.
        string side = thru.FlatnessDb <= FilterQA.Web.Ui.Services.ThruLimits.FlatnessLimitDb ? "within" : "over";
        Assert.Equal(side, cut.Find("td[data-flat]").GetAttribute("data-flat"));
    }

    [Fact]
    public async Task A_file_that_is_not_a_sweep_is_refused_with_the_readers_message()
    {
        await SeedAsync();
        var cut = Render<Stations>();
        cut.WaitForElement("tr[data-station]", TimeSpan.FromSeconds(10));
        cut.FindComponent<InputFile>().UploadFiles(InputFileContent.CreateFromText("frequency;level\nfast;slow\n", "thru.csv"));
        cut.WaitForElement("p.problem", TimeSpan.FromSeconds(20));
        Assert.Contains("thru.csv", cut.Find("p.problem").TextContent, StringComparison.Ordinal);
        Assert.Null(await Services.GetRequiredService<StationRegistry>().LatestThruAsync(Station));
    }
}
