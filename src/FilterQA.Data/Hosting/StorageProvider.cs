namespace FilterQA.Data.Hosting;

/// <summary>The database engine behind <see cref="FilterQaDbContext"/>.</summary>
public enum StorageProvider
{
    /// <summary>A single SQLite file in the data folder (the default; WAL mode).</summary>
    Sqlite,

    /// <summary>A PostgreSQL server, for a site with several stations.</summary>
    Postgres,
}
