using System.Security.Claims;
using Bunit;
using FilterQA.Core.Sampling;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Text;
using FilterQA.Data.Accounts;
using FilterQA.Data.Hosting;
using FilterQA.Data.Services;
using Microsoft.Data.Sqlite;
using Microsoft.Extensions.DependencyInjection;

namespace FilterQA.Web.Ui.Tests.Infrastructure;

/// <summary>
/// A bUnit context on its own SQLite database in a temporary data folder, with the shipped TME-CF455-15
/// template released, station IQC-1 and one lot of 1 200 (demo scenario names), and a signed-in operator.
/// </summary>
public abstract class SeededStore : BunitContext
{
    public const string Station = "IQC-1";
    public const string LotNumber = "VP-2611-0042";
    public const string PartNumber = "TME-CF455-15";

    private readonly string _folder = Path.Combine(Path.GetTempPath(), "filterqa-ui-" + Guid.NewGuid().ToString("N"));

    protected static readonly Actor Engineer = new("u-jlindqvist", "J. Lindqvist");

    protected SeededStore()
    {
        Directory.CreateDirectory(_folder);
        Services.AddFilterQaStorage(new StorageOptions { DataFolder = _folder });
        Services.AddFilterQaUi();
        JSInterop.Mode = JSRuntimeMode.Loose;
        var auth = AddAuthorization();
        auth.SetAuthorized("R. Haldane");
        auth.SetRoles(RoleNames.Operator);
        auth.SetClaims(new Claim(ClaimTypes.NameIdentifier, "u-rhaldane"));
    }

    protected async Task SeedAsync()
    {
        await StorageStartup.MigrateAsync(Services);
        TemplateReadResult read = LimitTemplateReader.ReadFile(RepositoryFiles.Template(PartNumber));
        LimitTemplate template = read.Template ?? throw new InvalidOperationException("the shipped template does not read: " + string.Join("; ", read.Problems));
        await Services.GetRequiredService<TemplateCatalog>().RegisterAsync(template, Engineer);
        await Services.GetRequiredService<StationRegistry>().RegisterStationAsync(Station, "network analyser, 455 kHz fixture", Engineer);
        await Services.GetRequiredService<LotService>().CreateLotAsync(
            new NewLot(LotNumber, PartNumber, null, "Veltrane Piezo", 1200, PlanRequest.Mil105E(InspectionLevel.II, 0.65)), Engineer);
    }

    protected override void Dispose(bool disposing)
    {
        base.Dispose(disposing);
        if (disposing)
        {
            SqliteConnection.ClearAllPools();
            try
            {
                Directory.Delete(_folder, recursive: true);
            }
            catch (IOException)
            {
                // A file still open by the operating system; the temporary folder is cleaned later.
            }
        }
    }
}
