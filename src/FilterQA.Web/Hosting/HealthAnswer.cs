namespace FilterQA.Web.Hosting;

/// <summary>The answer of GET /health: the host is up. Carries no data.</summary>
public sealed record HealthAnswer(string Status);
