using Xunit.Sdk;

namespace FilterQA.Data.Tests.Infrastructure;

/// <summary>
/// A fact of a storage contract: it runs for every provider class that inherits it, and is
/// skipped with a reason for a PostgreSQL class when no server is configured outside CI.
/// </summary>
[XunitTestCaseDiscoverer("FilterQA.Data.Tests.Infrastructure.StorageFactDiscoverer", "FilterQA.Data.Tests")]
[AttributeUsage(AttributeTargets.Method, AllowMultiple = false)]
public sealed class StorageFactAttribute : FactAttribute;
