using System.Text;
using FilterQA.Core.Formats.Delimited;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Tests.Formats.Delimited;

/// <summary>Helpers shared by the delimited-text tests: read a text given as a C# string.</summary>
internal static class DelimitedTestFiles
{
    public const string FileName = "lot-test.csv";

    public static byte[] Bytes(string text) => Encoding.UTF8.GetBytes(text);

    public static Sweep Read(string text, DelimitedTextOptions? options = null) =>
        DelimitedTextReader.Read(Bytes(text), FileName, options);

    public static double[] Hz(Sweep sweep) => sweep.Grid.Hz.ToArray();

    public static double[] Level(Sweep sweep) => sweep.Scalar!.LevelDb.ToArray();

    public static double[] Phase(Sweep sweep) => sweep.Scalar!.PhaseDeg.ToArray();
}
