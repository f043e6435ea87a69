using FilterQA.Data.Services;

namespace FilterQA.Web.Api.Keys;

/// <summary>A key just made. <see cref="Key"/> appears in this answer only; store it in the station's script now.</summary>
public sealed record CreatedApiKey(StationApiKeyInfo Info, string Key);
