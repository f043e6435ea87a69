using System.Globalization;

namespace FilterQA.Data.Services;

/// <summary>
/// A draft save refused because someone saved the draft after the editor loaded it: the editor's text was made from
/// an older version and would silently overwrite theirs. Nothing was stored.
/// </summary>
public sealed class DraftConflictException : Exception
{
    /// <summary>A refusal naming who saved in between and when.</summary>
    public DraftConflictException(string partNumber, int revision, int loadedVersion, int storedVersion, string savedBy, DateTimeOffset savedAt)
        : base(string.Create(CultureInfo.InvariantCulture,
            $"{partNumber} revision {revision} was saved by {savedBy} at {savedAt.UtcDateTime:yyyy-MM-dd HH:mm:ss} UTC after you opened it (you edited version {loadedVersion}, the stored draft is version {storedVersion}); your text was not saved. Reload the draft to see their change, then make yours again."))
    {
        PartNumber = partNumber;
        Revision = revision;
        LoadedVersion = loadedVersion;
        StoredVersion = storedVersion;
        SavedBy = savedBy;
        SavedAt = savedAt;
    }

    /// <summary>Needed by the analyzers; prefer the constructor with the details.</summary>
    public DraftConflictException()
        : this("", 0, 0, 0, "someone", DateTimeOffset.UnixEpoch)
    {
    }

    /// <summary>Needed by the analyzers; prefer the constructor with the details.</summary>
    public DraftConflictException(string message)
        : base(message)
    {
        PartNumber = SavedBy = "";
    }

    /// <summary>Needed by the analyzers; prefer the constructor with the details.</summary>
    public DraftConflictException(string message, Exception innerException)
        : base(message, innerException)
    {
        PartNumber = SavedBy = "";
    }

    /// <summary>The part.</summary>
    public string PartNumber { get; }

    /// <summary>The draft revision.</summary>
    public int Revision { get; }

    /// <summary>The version the editor loaded and edited.</summary>
    public int LoadedVersion { get; }

    /// <summary>The version stored now.</summary>
    public int StoredVersion { get; }

    /// <summary>Who saved the stored version.</summary>
    public string SavedBy { get; }

    /// <summary>When the stored version was saved (UTC).</summary>
    public DateTimeOffset SavedAt { get; }
}
