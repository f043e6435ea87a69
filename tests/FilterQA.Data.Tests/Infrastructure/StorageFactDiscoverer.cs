using Xunit.Abstractions;
using Xunit.Sdk;

namespace FilterQA.Data.Tests.Infrastructure;

/// <summary>Discovers <see cref="StorageFactAttribute"/> tests, deciding the skip per concrete test class.</summary>
public sealed class StorageFactDiscoverer(IMessageSink diagnosticMessageSink) : FactDiscoverer(diagnosticMessageSink)
{
    private readonly IMessageSink _sink = diagnosticMessageSink;

    public override IEnumerable<IXunitTestCase> Discover(ITestFrameworkDiscoveryOptions discoveryOptions, ITestMethod testMethod, IAttributeInfo factAttribute)
    {
        ArgumentNullException.ThrowIfNull(testMethod);
        Type? testClass = testMethod.TestClass.Class.ToRuntimeType();
        if (testClass is not null && typeof(IPostgresTests).IsAssignableFrom(testClass) && PostgresEnvironment.SkipReason is { } reason)
        {
            return [new XunitSkippedDataRowTestCase(_sink, discoveryOptions.MethodDisplayOrDefault(), discoveryOptions.MethodDisplayOptionsOrDefault(),
                testMethod, reason)];
        }
        return base.Discover(discoveryOptions, testMethod, factAttribute);
    }
}
