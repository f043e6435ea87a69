namespace FilterQA.Web.Api.Keys;

/// <summary>The body of POST …/api-keys: what the key is for.</summary>
public sealed record NewApiKeyRequest(string Label);
