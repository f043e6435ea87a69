namespace FilterQA.Cli.Arguments;

/// <summary>The command line itself is wrong (unknown option, missing value, bad number): exit code 1.</summary>
public sealed class UsageException : Exception
{
    public UsageException(string message) : base(message)
    {
    }

    public UsageException()
    {
    }

    public UsageException(string message, Exception innerException) : base(message, innerException)
    {
    }
}
