using FilterQA.Data.Hosting;

namespace FilterQA.Data.Tests.Hosting;

/// <summary>
/// The data folder follows the XDG base-directory specification (XDG_DATA_HOME, else
/// ~/.local/share; a relative XDG value is ignored) and is never the current directory.
/// </summary>
public sealed class DataFolderTests
{
    private static Func<string, string?> Env(string? xdg) => name => name switch
    {
        "HOME" => "/srv/inspector",
        "XDG_DATA_HOME" => xdg,
        _ => null,
    };

    [Theory]
    [InlineData(null, null, "/srv/inspector/.local/share/filterqa")]
    [InlineData(null, "/srv/xdg", "/srv/xdg/filterqa")]
    [InlineData(null, "relative/xdg", "/srv/inspector/.local/share/filterqa")]
    [InlineData("/var/lib/filterqa", "/srv/xdg", "/var/lib/filterqa")]
    [InlineData("~/qa-data", null, "/srv/inspector/qa-data")]
    [InlineData("qa-data", null, "/srv/inspector/qa-data")]
    public void The_folder_is_resolved_from_configuration_then_xdg_then_home(string? configured, string? xdg, string expected)
    {
        Assert.Equal(expected, DataFolder.Resolve(configured, Env(xdg)));
    }

    [Fact]
    public void A_relative_sqlite_file_is_placed_in_the_data_folder_not_the_current_directory()
    {
        string folder = Path.Combine(Path.GetTempPath(), "filterqa-folder-" + Guid.NewGuid().ToString("N"));
        try
        {
            string connection = StorageSetup.SqliteConnectionString(new StorageOptions { ConnectionString = "Data Source=site.db", DataFolder = folder });

            Assert.Contains($"Data Source={Path.Combine(folder, "site.db")}", connection, StringComparison.Ordinal);
            Assert.True(Directory.Exists(folder));
            Assert.Contains(Path.Combine(folder, "filterqa.db"), StorageSetup.SqliteConnectionString(new StorageOptions { DataFolder = folder }), StringComparison.Ordinal);
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    [Fact]
    public void Postgres_without_a_connection_string_is_refused_by_name()
    {
        var problem = Assert.Throws<InvalidOperationException>(() =>
            StorageSetup.Configure(new Microsoft.EntityFrameworkCore.DbContextOptionsBuilder(), new StorageOptions { Provider = StorageProvider.Postgres }));
        Assert.Contains("Storage:ConnectionString", problem.Message, StringComparison.Ordinal);
    }
}
