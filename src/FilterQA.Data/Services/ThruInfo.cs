namespace FilterQA.Data.Services;

/// <summary>A stored thru reference: flatness is the peak-to-peak loss variation over its sweep, in dB.</summary>
public sealed record ThruInfo(long Id, string Station, DateTimeOffset MeasuredAt, double FlatnessDb, string RawSha256, string FileName);
