using System.Text;
using System.Text.Json;
using FilterQA.Core.Measurement;
using FilterQA.Core.Resonators;

namespace FilterQA.Cli.Commands;

/// <summary>
/// The fixed JSON contract of <c>measure --json</c>: one object, camelCase, SI units, numbers as JSON
/// numbers, null where not measurable, never NaN or Infinity.
/// </summary>
internal static class MeasureJson
{
    public static string Write(MeasureReport report)
    {
        using var buffer = new MemoryStream();
        using (var json = new Utf8JsonWriter(buffer, new JsonWriterOptions { Indented = false }))
        {
            json.WriteStartObject();
            json.WriteNumber("points", report.Grid.Count);
            Number(json, "startHz", report.Grid.StartHz);
            Number(json, "stopHz", report.Grid.StopHz);
            FilterMeasurement filter = report.Filter;
            Number(json, "minLossHz", filter.MinLossHz);
            Number(json, "insertionLossDb", filter.InsertionLossDb);
            json.WriteStartArray("bands");
            foreach (LevelBandwidth band in filter.Bands)
            {
                json.WriteStartObject();
                Number(json, "levelDb", band.LevelDb);
                Number(json, "lowerHz", band.LowerHz);
                Number(json, "upperHz", band.UpperHz);
                Number(json, "bandwidthHz", band.BandwidthHz);
                Number(json, "centreHz", band.CentreHz);
                Number(json, "geometricCentreHz", band.GeometricCentreHz);
                json.WriteEndObject();
            }
            json.WriteEndArray();
            Number(json, "rippleDb", filter.RippleDb);
            json.WriteStartArray("stopbands");
            foreach (StopbandResult stopband in filter.Stopbands)
            {
                json.WriteStartObject();
                Number(json, "startHz", stopband.StartHz);
                Number(json, "stopHz", stopband.StopHz);
                Number(json, "minRejectionDb", stopband.MinRejectionDb);
                Number(json, "absoluteLossDb", stopband.AbsoluteLossDb);
                Number(json, "atHz", stopband.AtHz);
                json.WriteBoolean("floorLimited", stopband.FloorLimited);
                json.WriteEndObject();
            }
            json.WriteEndArray();
            WriteResonator(json, report.Resonator);
            json.WriteStartArray("warnings");
            foreach (string warning in report.Warnings)
            {
                json.WriteStringValue(warning);
            }
            json.WriteEndArray();
            json.WriteEndObject();
        }
        return Encoding.UTF8.GetString(buffer.ToArray());
    }

    private static void WriteResonator(Utf8JsonWriter json, ResonatorMeasurement? fit)
    {
        if (fit is null)
        {
            json.WriteNull("resonator");
            return;
        }
        json.WriteStartObject("resonator");
        Number(json, "peakHz", fit.PeakHz);
        Number(json, "peakLossDb", fit.PeakLossDb);
        Number(json, "notchHz", fit.NotchHz);
        Number(json, "notchLossDb", fit.NotchLossDb);
        Number(json, "seriesHz", fit.SeriesHz);
        Number(json, "parallelHz", fit.ParallelHz);
        Number(json, "r1Ohm", fit.R1Ohm);
        Number(json, "c1F", fit.C1F);
        Number(json, "l1H", fit.L1H);
        Number(json, "c0F", fit.C0F);
        Number(json, "unloadedQ", fit.UnloadedQ);
        Number(json, "loadedQ", fit.LoadedQ);
        json.WriteStartArray("unwantedModes");
        foreach (UnwantedMode mode in fit.UnwantedModes)
        {
            json.WriteStartObject();
            Number(json, "hz", mode.Hz);
            Number(json, "relativeDb", mode.RelativeDb);
            json.WriteEndObject();
        }
        json.WriteEndArray();
        json.WriteEndObject();
    }

    // A value that is not finite can never be printed as a number: the contract says null.
    private static void Number(Utf8JsonWriter json, string name, double? value)
    {
        if (value is { } v && double.IsFinite(v))
        {
            json.WriteNumber(name, v);
        }
        else
        {
            json.WriteNull(name);
        }
    }
}
