namespace FilterQA.Data.Entities;

/// <summary>A part number under incoming inspection, with its retest policy.</summary>
public sealed class PartRecord
{
    public long Id { get; set; }

    public required string PartNumber { get; set; }

    public required string Description { get; set; }

    /// <summary>Device kind as the template names it (a <c>DeviceKind</c> value).</summary>
    public required string DeviceKind { get; set; }

    /// <summary>How many retests a unit may have (0 = the first measurement is the only one that counts).</summary>
    public int MaxRetests { get; set; }

    /// <summary>
    /// True: a unit's latest attempt within <see cref="MaxRetests"/> decides it for the lot.
    /// False: retests are for information only and the first attempt decides.
    /// </summary>
    public bool RetestCounts { get; set; }

    public DateTimeOffset CreatedAt { get; set; }

    public List<TemplateRevisionRecord> Revisions { get; set; } = [];
}
