namespace FilterQA.Data.Services;

/// <summary>How a what-if run reads and works; the defaults suit a site database on a small machine.</summary>
public sealed record WhatIfOptions
{
    /// <summary>The defaults: pages of 512 rows, one worker per core, progress every 250 measurements.</summary>
    public static WhatIfOptions Default { get; } = new();

    /// <summary>Rows read per query (by ascending measurement id), 1 or more. Memory held is about two pages of traces.</summary>
    public int PageSize { get; init; } = 512;

    /// <summary>Measurements judged at once, 1 or more.</summary>
    public int MaxDegreeOfParallelism { get; init; } = Environment.ProcessorCount;

    /// <summary>A progress report is made every this many measurements (and once at the end), 1 or more.</summary>
    public int ProgressInterval { get; init; } = 250;
}
