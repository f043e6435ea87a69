namespace FilterQA.Data.Services;

/// <summary>A key just made: <see cref="Key"/> is shown to the administrator this once and stored only as its hash.</summary>
public sealed record NewStationApiKey(StationApiKeyInfo Info, string Key);
