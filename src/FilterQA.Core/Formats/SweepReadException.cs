using System.Globalization;
using System.Text;

namespace FilterQA.Core.Formats;

/// <summary>
/// The one exception type a sweep reader throws: the file cannot be read or used. It names the
/// file, the line and column (1-based; 0 when the problem is not at one place) and what was expected.
/// A reader that throws it has returned nothing: there are no half-read sweeps.
/// </summary>
public sealed class SweepReadException : Exception
{
    /// <summary>Makes the exception; the message is built from the parts.</summary>
    public SweepReadException(string fileName, int line, int column, string problem)
        : base(Compose(fileName, line, column, problem))
    {
        FileName = fileName;
        Line = line;
        Column = column;
        Problem = problem;
    }

    /// <summary>Makes the exception with a cause kept for diagnostics.</summary>
    public SweepReadException(string fileName, int line, int column, string problem, Exception inner)
        : base(Compose(fileName, line, column, problem), inner)
    {
        FileName = fileName;
        Line = line;
        Column = column;
        Problem = problem;
    }

    /// <summary>Not for use: the reader always names file, line, column and problem.</summary>
    public SweepReadException() : this("", 0, 0, "the sweep cannot be read")
    {
    }

    /// <summary>Not for use: the reader always names file, line, column and problem.</summary>
    public SweepReadException(string message) : this("", 0, 0, message)
    {
    }

    /// <summary>Not for use: the reader always names file, line, column and problem.</summary>
    public SweepReadException(string message, Exception innerException) : this("", 0, 0, message, innerException)
    {
    }

    /// <summary>Name of the file (as given to the reader).</summary>
    public string FileName { get; }

    /// <summary>1-based line, or 0 when the problem concerns the whole file.</summary>
    public int Line { get; }

    /// <summary>1-based column, or 0 when the problem concerns the whole line or file.</summary>
    public int Column { get; }

    /// <summary>What was wrong and what was expected, without the location.</summary>
    public string Problem { get; }

    private static string Compose(string fileName, int line, int column, string problem)
    {
        var text = new StringBuilder(fileName.Length == 0 ? "(sweep)" : fileName);
        if (line > 0)
        {
            text.Append(CultureInfo.InvariantCulture, $", line {line}");
            if (column > 0)
            {
                text.Append(CultureInfo.InvariantCulture, $", column {column}");
            }
        }
        return text.Append(": ").Append(problem).ToString();
    }
}
