using UglyToad.PdfPig;
using UglyToad.PdfPig.Tokens;

namespace FilterQA.Reports.Tests.Infrastructure;

/// <summary>The raw dictionaries of a PDF's indirect objects, read with PdfPig's structure access.</summary>
public static class PdfObjects
{
    public static IEnumerable<IReadOnlyDictionary<string, IToken>> Dictionaries(PdfDocument document)
    {
        foreach (var reference in document.Structure.CrossReferenceTable.ObjectOffsets.Keys)
        {
            IToken? data;
            try
            {
                data = document.Structure.GetObject(reference).Data;
            }
            catch (InvalidOperationException)
            {
                continue;
            }
            if (data is DictionaryToken dictionary)
            {
                yield return dictionary.Data;
            }
            else if (data is StreamToken stream)
            {
                yield return stream.StreamDictionary.Data;
            }
        }
    }
}
