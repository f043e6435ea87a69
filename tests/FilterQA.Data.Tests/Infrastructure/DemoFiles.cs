using System.Text;
using FilterQA.Core.Formats;
using FilterQA.Core.Formats.Delimited;
using FilterQA.Core.Formats.Touchstone;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Synthesis;
using FilterQA.Data.Services;

namespace FilterQA.Data.Tests.Infrastructure;

/// <summary>
/// Sweep files of the demo parts as a bench would send them: synthetic units written as Touchstone (network analyser)
/// or delimited text (power traces). Demo data for the storage path only; expected verdicts come from the engine
/// judging the same file directly, never from these generators.
/// </summary>
public static class DemoFiles
{
    public const string Ceramic455 = "TME-CF455-15";

    private static readonly UnitSynthesiser Synthesiser = new(2544);

    public static DemoPart Part(string partNumber = Ceramic455) => DemoParts.Get(partNumber);

    /// <summary>A network-analyser unit as a Touchstone file (bytes, file name S0001.s2p and so on).</summary>
    public static (byte[] Bytes, string FileName) NetworkUnit(int serialIndex, DefectKind defect = DefectKind.None, string partNumber = Ceramic455)
    {
        Sweep sweep = Synthesiser.Unit(Part(partNumber), serialIndex, defect);
        return (Encoding.UTF8.GetBytes(TouchstoneWriter.WriteToString(sweep)), UnitSynthesiser.Serial(serialIndex) + ".s2p");
    }

    /// <summary>A unit measured as a power trace (dBm) at <paramref name="station"/>, as delimited text.</summary>
    public static (byte[] Bytes, string FileName) PowerUnit(int serialIndex, string station, DefectKind defect = DefectKind.None) =>
        (Delimited(Synthesiser.PowerUnit(Part(), serialIndex, station, defect)), UnitSynthesiser.Serial(serialIndex) + "_power.csv");

    /// <summary>The station's power-trace thru as delimited text.</summary>
    public static (byte[] Bytes, string FileName) PowerThru(string station) => (Delimited(Synthesiser.PowerThru(Part(), station)), station + "_thru.csv");

    public static byte[] Delimited(Sweep sweep)
    {
        using var text = new StringWriter();
        DelimitedTextWriter.Write(sweep, text);
        return Encoding.UTF8.GetBytes(text.ToString());
    }

    /// <summary>Records a thru read from <paramref name="file"/> at <paramref name="station"/>, measured at <paramref name="measuredAt"/>.</summary>
    public static async Task<ThruInfo> RecordThruAsync(TestStore store, string station, (byte[] Bytes, string FileName) file, DateTimeOffset measuredAt)
    {
        ArgumentNullException.ThrowIfNull(store);
        Sweep sweep = SweepFileReader.Read(file.Bytes, file.FileName);
        return await store.Stations.RecordThruAsync(new ThruInput(station, file.Bytes, sweep, ResponseTrace.Primary(sweep), measuredAt, Samples.Operator));
    }

    public static SweepSubmission Submission(PreparedLot lot, string serial, (byte[] Bytes, string FileName) file) =>
        new(lot.LotNumber, serial, lot.Station, Samples.Operator, file.Bytes, file.FileName);
}
