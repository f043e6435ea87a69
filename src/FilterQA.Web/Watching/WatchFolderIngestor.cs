using System.Globalization;
using System.Security.Cryptography;
using FilterQA.Core.Formats;
using FilterQA.Data;
using FilterQA.Data.Accounts;
using FilterQA.Data.Services;
using Microsoft.AspNetCore.Identity;

namespace FilterQA.Web.Watching;

/// <summary>
/// Takes sweep files dropped in one station's folder through <see cref="SweepIntake"/>. A file is taken when
/// its size and modification time have been stable for the configured time (or never while it ends in
/// ".part"), moved first into processing/ (a rename, so no file is taken twice), then into done/ or into
/// failed/ beside a "&lt;name&gt;.reason.txt". The idempotency key is the file's SHA-256, so the same file dropped
/// again is stored once. Names are checked before use; a refused name is moved to failed/ under a made-up
/// name, and a symbolic link is moved without being followed. A file left in processing/ by a stop or an
/// unexpected error is tried again at the next scan. Scans of one folder never overlap.
/// </summary>
public sealed class WatchFolderIngestor(WatchedFolder watched, WatchOptions options, IServiceScopeFactory scopes, TimeProvider clock,
    ILogger<WatchFolderIngestor> log)
{
    private readonly Dictionary<string, (long Length, DateTime WrittenUtc, DateTimeOffset Since)> _seen = new(StringComparer.Ordinal);
    private readonly SemaphoreSlim _gate = new(1, 1);

    public WatchedFolder Watched => watched;

    public string Processing => Path.Combine(watched.Folder, "processing");

    public string Done => Path.Combine(watched.Folder, "done");

    public string Failed => Path.Combine(watched.Folder, "failed");

    /// <summary>One scan: takes the stable files, then works through processing/. Returns how many files were finished.</summary>
    public async Task<int> ScanOnceAsync(CancellationToken cancellationToken = default)
    {
        await _gate.WaitAsync(cancellationToken).ConfigureAwait(false);
        try
        {
            Directory.CreateDirectory(Processing);
            Directory.CreateDirectory(Done);
            Directory.CreateDirectory(Failed);
            TakeStableFiles();
            int finished = 0;
            foreach (FileInfo file in new DirectoryInfo(Processing).EnumerateFiles().OrderBy(f => f.Name, StringComparer.Ordinal).ToList())
            {
                finished += await IngestAsync(file, cancellationToken).ConfigureAwait(false) ? 1 : 0;
            }
            return finished;
        }
        finally
        {
            _gate.Release();
        }
    }

    private void TakeStableFiles()
    {
        DateTimeOffset now = clock.GetUtcNow();
        var present = new HashSet<string>(StringComparer.Ordinal);
        foreach (FileInfo file in new DirectoryInfo(watched.Folder).EnumerateFiles())
        {
            string name = file.Name;
            present.Add(name);
            if (name.EndsWith(WatchFileName.PartSuffix, StringComparison.OrdinalIgnoreCase) && file.LinkTarget is null)
            {
                continue;
            }
            if (!_seen.TryGetValue(name, out var seen) || seen.Length != file.Length || seen.WrittenUtc != file.LastWriteTimeUtc)
            {
                _seen[name] = (file.Length, file.LastWriteTimeUtc, now);
                if (options.StableSeconds > 0)
                {
                    continue;
                }
            }
            else if ((now - seen.Since).TotalSeconds < options.StableSeconds)
            {
                continue;
            }
            _seen.Remove(name);
            Take(file);
        }
        foreach (string gone in _seen.Keys.Where(k => !present.Contains(k)).ToList())
        {
            _seen.Remove(gone);
        }
    }

    private void Take(FileInfo file)
    {
        (string? _, string? _, string? problem) = WatchFileName.Parse(file.Name);
        if (file.LinkTarget is not null)
        {
            problem = "the file is a symbolic link; links are not followed";
        }
        try
        {
            if (problem is not null)
            {
                // The refused name is never used to build a path: the file gets a name of our own.
                string target = Unique(Failed, "refused-" + clock.GetUtcNow().ToString("yyyyMMdd-HHmmss", CultureInfo.InvariantCulture) + "-"
                    + Guid.NewGuid().ToString("N")[..8] + ".bin");
                File.Move(file.FullName, target);
                WriteReason(target, $"refused file name {Escape(file.Name)}: {problem}");
                log.LogWarning("Watched folder of {Station}: refused a file name ({Problem}); moved to {Target}", watched.Station, problem, target);
                return;
            }
            string processing = Path.Combine(Processing, file.Name);
            if (File.Exists(processing))
            {
                return; // the earlier file of this name is still being worked on; take this one next time
            }
            File.Move(file.FullName, processing);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            log.LogWarning(e, "Watched folder of {Station}: could not move a file yet; trying again at the next scan", watched.Station);
        }
    }

    private async Task<bool> IngestAsync(FileInfo file, CancellationToken cancellationToken)
    {
        (string? lotNumber, string? serial, string? problem) = WatchFileName.Parse(file.Name);
        if (problem is not null)
        {
            Finish(file, Failed, $"refused file name {Escape(file.Name)}: {problem}");
            return true;
        }
        try
        {
            byte[] bytes = await File.ReadAllBytesAsync(file.FullName, cancellationToken).ConfigureAwait(false);
            string sha = Convert.ToHexStringLower(SHA256.HashData(bytes));
            await using AsyncServiceScope scope = scopes.CreateAsyncScope();
            Actor actor = await ActorAsync(scope.ServiceProvider).ConfigureAwait(false);
            IntakeResult result = await scope.ServiceProvider.GetRequiredService<SweepIntake>().SubmitAsync(
                new SweepSubmission(lotNumber!, serial!, watched.Station, actor, bytes, file.Name) { IdempotencyKey = "file:" + sha },
                cancellationToken).ConfigureAwait(false);
            Finish(file, Done, null);
            log.LogInformation("Watched folder of {Station}: {Lot} unit {Serial} stored as measurement {Measurement} ({Verdict}{Again})",
                watched.Station, lotNumber, serial, result.Stored.MeasurementId, result.Stored.Verdict, result.Stored.WasAlreadyStored ? ", already stored" : "");
            return true;
        }
        catch (Exception e) when (e is SweepReadException or IntakeRefusedException or RecordNotFoundException or StorageRuleException)
        {
            Finish(file, Failed, e.Message);
            log.LogWarning("Watched folder of {Station}: {File} not stored: {Reason}", watched.Station, file.Name, e.Message);
            return true;
        }
        catch (Exception e) when (e is not OperationCanceledException)
        {
            log.LogError(e, "Watched folder of {Station}: {File} stays in processing/ and is tried again at the next scan", watched.Station, file.Name);
            return false;
        }
    }

    private async Task<Actor> ActorAsync(IServiceProvider provider)
    {
        if (watched.OperatorUserName is { Length: > 0 } userName)
        {
            UserManager<FilterQaUser> users = provider.GetRequiredService<UserManager<FilterQaUser>>();
            FilterQaUser user = await users.FindByNameAsync(userName).ConfigureAwait(false) ?? throw new RecordNotFoundException(
                $"Stations:{watched.Station}:WatchOperator names the account '{userName}', which does not exist");
            return new Actor(user.Id, user.DisplayName.Length > 0 ? user.DisplayName : userName, await users.IsInRoleAsync(user, RoleNames.Approver).ConfigureAwait(false));
        }
        return new Actor("watch:" + watched.Station, watched.Station + " watched folder");
    }

    private void Finish(FileInfo file, string folder, string? reason)
    {
        string target = Unique(folder, file.Name);
        File.Move(file.FullName, target);
        if (reason is not null)
        {
            WriteReason(target, reason);
        }
    }

    private static void WriteReason(string target, string reason) =>
        File.WriteAllText(target + ".reason.txt", reason + Environment.NewLine);

    // A name already in done/ or failed/ (the same file dropped again) gets a time and a counter, never overwriting.
    private string Unique(string folder, string name)
    {
        string path = Path.Combine(folder, name);
        for (int n = 1; File.Exists(path) || File.Exists(path + ".reason.txt"); n++)
        {
            path = Path.Combine(folder, FormattableString.Invariant($"{Path.GetFileNameWithoutExtension(name)}.{clock.GetUtcNow():yyyyMMddHHmmss}-{n}{Path.GetExtension(name)}"));
        }
        return path;
    }

    private static string Escape(string name) =>
        "'" + string.Concat((name.Length > 200 ? name[..200] + "…" : name).Select(c => char.IsControl(c) ? FormattableString.Invariant($"\\u{(int)c:x4}") : c.ToString())) + "'";
}
