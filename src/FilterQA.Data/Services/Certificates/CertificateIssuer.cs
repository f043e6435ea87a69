namespace FilterQA.Data.Services.Certificates;

/// <summary>The company that issues the certificate, as printed in its heading.</summary>
public sealed record CertificateIssuer(string Name, IReadOnlyList<string> AddressLines);
