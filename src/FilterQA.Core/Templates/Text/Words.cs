using System.Collections.Frozen;
using System.Text;

namespace FilterQA.Core.Templates.Text;

/// <summary>
/// The words the text format uses for enum values: the member name in lower case with hyphens between
/// words (CentreFrequency → centre-frequency, UnloadedQ → unloaded-q). One rule for every enum keeps the
/// file vocabulary predictable and in step with the model.
/// </summary>
internal static class Words
{
    /// <summary>The file word for <paramref name="value"/>.</summary>
    internal static string Of<T>(T value) where T : struct, Enum => Table<T>.ByValue[value];

    /// <summary>Reads a file word (exact, lower case); false when it names no member.</summary>
    internal static bool TryRead<T>(string word, out T value) where T : struct, Enum => Table<T>.ByWord.TryGetValue(word, out value);

    /// <summary>Every file word of <typeparamref name="T"/>, in declaration order.</summary>
    internal static IReadOnlyList<string> All<T>() where T : struct, Enum => Table<T>.InOrder;

    internal static string Hyphenate(string name)
    {
        var text = new StringBuilder(name.Length + 4);
        for (int i = 0; i < name.Length; i++)
        {
            char c = name[i];
            if (char.IsUpper(c) && i > 0)
            {
                text.Append('-');
            }
            text.Append(char.ToLowerInvariant(c));
        }
        return text.ToString();
    }

    private static class Table<T> where T : struct, Enum
    {
        internal static readonly IReadOnlyList<string> InOrder = Enum.GetValues<T>().Select(value => Hyphenate(value.ToString())).ToArray();

        internal static readonly FrozenDictionary<T, string> ByValue = Enum.GetValues<T>().ToFrozenDictionary(value => value, value => Hyphenate(value.ToString()));

        internal static readonly FrozenDictionary<string, T> ByWord = Enum.GetValues<T>().ToFrozenDictionary(value => Hyphenate(value.ToString()), value => value, StringComparer.Ordinal);
    }
}
