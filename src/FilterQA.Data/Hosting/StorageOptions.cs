namespace FilterQA.Data.Hosting;

/// <summary>The "Storage" configuration section.</summary>
public sealed class StorageOptions
{
    /// <summary>Configuration section name.</summary>
    public const string Section = "Storage";

    /// <summary>Sqlite (default) or Postgres.</summary>
    public StorageProvider Provider { get; set; } = StorageProvider.Sqlite;

    /// <summary>
    /// Provider connection string. For SQLite it may be empty (the file is filterqa.db in the data
    /// folder) or name a relative Data Source, which is resolved against the data folder, never
    /// the current directory. Required for PostgreSQL.
    /// </summary>
    public string? ConnectionString { get; set; }

    /// <summary>Folder for the SQLite file; empty means $XDG_DATA_HOME/filterqa, else ~/.local/share/filterqa.</summary>
    public string? DataFolder { get; set; }

    /// <summary>Assembly holding the SQLite migrations.</summary>
    public const string SqliteMigrationsAssembly = "FilterQA.Migrations.Sqlite";

    /// <summary>Assembly holding the PostgreSQL migrations.</summary>
    public const string PostgresMigrationsAssembly = "FilterQA.Migrations.Postgres";
}
