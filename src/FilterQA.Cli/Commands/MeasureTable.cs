using System.Globalization;
using FilterQA.Core.Measurement;
using FilterQA.Core.Resonators;

namespace FilterQA.Cli.Commands;

/// <summary>The readable form of <c>measure</c>: frequencies in MHz with enough digits for ppm work, losses in dB.</summary>
internal static class MeasureTable
{
    public static void Write(MeasureReport report, TextWriter o)
    {
        FilterMeasurement f = report.Filter;
        o.WriteLine(Invariant($"sweep           {report.Grid.Count} points, {Mhz(report.Grid.StartHz)} to {Mhz(report.Grid.StopHz)}"));
        o.WriteLine(Invariant($"insertion loss  {f.InsertionLossDb:0.000} dB at {Mhz(f.MinLossHz)}"));
        o.WriteLine();
        o.WriteLine("level dB   lower              upper              bandwidth        centre (arith.)    centre (geom.)");
        foreach (LevelBandwidth b in f.Bands)
        {
            o.WriteLine(Invariant($"{b.LevelDb,8:0.###}   {Mhz(b.LowerHz),-17}  {Mhz(b.UpperHz),-17}  {Khz(b.BandwidthHz),-15}  {Mhz(b.CentreHz),-17}  {Mhz(b.GeometricCentreHz)}"));
        }
        if (f.RippleDb is { } ripple)
        {
            o.WriteLine();
            o.WriteLine(Invariant($"passband ripple {ripple:0.000} dB"));
        }
        if (f.Stopbands.Count > 0)
        {
            o.WriteLine();
            o.WriteLine("stopband                                 rejection      absolute loss   at");
            foreach (StopbandResult s in f.Stopbands)
            {
                string rejection = s.MinRejectionDb is { } r ? Invariant($"{(s.FloorLimited ? ">= " : "")}{r:0.00} dB") : "-";
                string absolute = s.AbsoluteLossDb is { } a ? Invariant($"{(s.FloorLimited ? ">= " : "")}{a:0.00} dB") : "-";
                o.WriteLine(Invariant($"{Mhz(s.StartHz) + " to " + Mhz(s.StopHz),-40} {rejection,-14} {absolute,-15} {Mhz(s.AtHz)}"));
            }
        }
        if (report.Resonator is { } r1)
        {
            WriteResonator(r1, o);
        }
        if (report.Warnings.Count > 0)
        {
            o.WriteLine();
            o.WriteLine("warnings");
            foreach (string w in report.Warnings)
            {
                o.WriteLine("  - " + w);
            }
        }
    }

    private static void WriteResonator(ResonatorMeasurement r, TextWriter o)
    {
        o.WriteLine();
        o.WriteLine("resonator (Butterworth–Van Dyke fit)");
        o.WriteLine(Invariant($"  peak          {Mhz(r.PeakHz)}  {Db(r.PeakLossDb)}"));
        o.WriteLine(Invariant($"  notch         {Mhz(r.NotchHz)}  {Db(r.NotchLossDb)}"));
        o.WriteLine(Invariant($"  fs            {Mhz(r.SeriesHz)}"));
        o.WriteLine(Invariant($"  fp            {Mhz(r.ParallelHz)}"));
        o.WriteLine(Invariant($"  R1            {Value(r.R1Ohm, 1, "0.000", "ohm")}"));
        o.WriteLine(Invariant($"  C1            {Value(r.C1F, 1e15, "0.0000", "fF")}"));
        o.WriteLine(Invariant($"  L1            {Value(r.L1H, 1e3, "0.0000", "mH")}"));
        o.WriteLine(Invariant($"  C0            {Value(r.C0F, 1e12, "0.000", "pF")}"));
        o.WriteLine(Invariant($"  Q unloaded    {Value(r.UnloadedQ, 1, "0", "")}"));
        o.WriteLine(Invariant($"  Q loaded      {Value(r.LoadedQ, 1, "0", "")}"));
        foreach (UnwantedMode mode in r.UnwantedModes)
        {
            o.WriteLine(Invariant($"  unwanted mode {Mhz(mode.Hz)}  {mode.RelativeDb:0.00} dB relative to the main response"));
        }
    }

    private static string Mhz(double? hz) => hz is { } v ? Invariant($"{v / 1e6:0.000000} MHz") : "-";

    private static string Khz(double? hz) => hz is { } v ? Invariant($"{v / 1e3:0.000} kHz") : "-";

    private static string Db(double? db) => db is { } v ? Invariant($"{v:0.000} dB") : "-";

    private static string Value(double? value, double scale, string format, string unit) =>
        value is { } v ? (v * scale).ToString(format, CultureInfo.InvariantCulture) + (unit.Length > 0 ? " " + unit : "") : "-";

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
