namespace FilterQA.Data.Tests.Infrastructure;

/// <summary>The failure a test injects in the middle of a write.</summary>
public sealed class InjectedFailureException(string message) : Exception(message);
