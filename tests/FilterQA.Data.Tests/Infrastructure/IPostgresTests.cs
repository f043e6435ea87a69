namespace FilterQA.Data.Tests.Infrastructure;

/// <summary>Marks a test class that runs against PostgreSQL (skipped outside CI when no server is configured).</summary>
public interface IPostgresTests;
