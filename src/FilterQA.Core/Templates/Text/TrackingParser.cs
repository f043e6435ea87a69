using YamlDotNet.Core;
using YamlDotNet.Core.Events;

namespace FilterQA.Core.Templates.Text;

/// <summary>
/// A YAML parser that remembers where the last good event ended, so a failure that YamlDotNet reports
/// without a position (an unclosed bracket at the end of the text) can still be placed.
/// </summary>
internal sealed class TrackingParser(IParser inner) : IParser
{
    /// <summary>End of the last event read, or an empty mark before the first.</summary>
    internal Mark LastGood { get; private set; } = Mark.Empty;

    /// <inheritdoc/>
    public ParsingEvent? Current => inner.Current;

    /// <inheritdoc/>
    public bool MoveNext()
    {
        bool moved = inner.MoveNext();
        if (moved && inner.Current is { } current)
        {
            LastGood = current.End;
        }
        return moved;
    }
}
