namespace FilterQA.Data.Services;

/// <summary>An online copy of the SQLite database: where it is, its size in bytes, and SQLite's integrity_check answer ("ok" when sound).</summary>
public sealed record BackupResult(string Path, long Bytes, string IntegrityCheck)
{
    public bool IsSound => IntegrityCheck == "ok";
}
