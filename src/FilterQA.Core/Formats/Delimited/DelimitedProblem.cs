namespace FilterQA.Core.Formats.Delimited;

/// <summary>
/// A problem found while reading, before the file name is attached; the reader turns it into a
/// <see cref="SweepReadException"/> and nothing else. Never leaves the reader.
/// </summary>
internal sealed class DelimitedProblem : Exception
{
    public DelimitedProblem(int line, int column, string problem) : base(problem)
    {
        Line = line;
        Column = column;
    }

    public DelimitedProblem()
    {
    }

    public DelimitedProblem(string message) : base(message)
    {
    }

    public DelimitedProblem(string message, Exception innerException) : base(message, innerException)
    {
    }

    public int Line { get; }

    public int Column { get; }
}
