using FilterQA.Core.Decisions;
using FilterQA.Core.Formats;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;
using FilterQA.Data.Codecs;
using FilterQA.Data.Entities;

namespace FilterQA.Benchmarks.Storage;

/// <summary>
/// One received sweep file made ready to store as the intake would store it: the original bytes compressed with their
/// SHA-256, the compact trace of the normalised response, the verdict and every rule result against a template.
/// </summary>
internal sealed record StoredSample(string FileName, SweepFormat Format, int RawLength, string RawSha256, byte[] RawCompressed, byte[] Trace,
    ResponseTrace Response, UnitVerdict Verdict, string Warnings, RuleResultRecord[] Rules)
{
    /// <summary>Reads <paramref name="bytes"/> as the file <paramref name="fileName"/> and judges it against <paramref name="template"/> (no thru: taken as calibrated or already normalised).</summary>
    public static StoredSample FromFile(byte[] bytes, string fileName, LimitTemplate template)
    {
        Sweep read = SweepFileReader.Read(bytes, fileName);
        var input = MeasurementInput.FromSweep(read);
        UnitEvaluation evaluation = TemplateEvaluator.Evaluate(template, input);
        return new StoredSample(fileName, read.Source.Format, bytes.Length, SweepBytes.Sha256Hex(bytes), SweepBytes.Compress(bytes),
            ResponseTraceCodec.Encode(input.Primary), input.Primary, evaluation.Verdict, string.Join('\n', evaluation.Warnings),
            evaluation.Rules.Select((r, i) => new RuleResultRecord
            {
                Ordinal = i, RuleId = r.RuleId, Kind = r.Kind, Title = r.Title, Unit = r.Unit, MeasuredValue = r.MeasuredValue, LimitValue = r.LimitValue,
                Sense = r.Sense, Margin = r.Margin, GuardBand = r.GuardBand, Outcome = r.Outcome, IsLowerBound = r.IsLowerBound, AtHz = r.AtHz, Message = r.Message,
            }).ToArray());
    }

    /// <summary>The stored sweep columns of a new measurement row.</summary>
    public StoredSweep Stored() => new()
    {
        FileName = FileName, Format = Format, RawLength = RawLength, RawSha256 = RawSha256, RawCompressed = RawCompressed,
        Path = Response.Path, PointCount = Response.Grid.Count, StartHz = Response.Grid.StartHz, StopHz = Response.Grid.StopHz, Trace = Trace,
    };

    /// <summary>Fresh rule result rows (an entity instance belongs to one measurement), in template order.</summary>
    public List<RuleResultRecord> RuleRows() => Rules.Select(r => new RuleResultRecord
    {
        Ordinal = r.Ordinal, RuleId = r.RuleId, Kind = r.Kind, Title = r.Title, Unit = r.Unit, MeasuredValue = r.MeasuredValue, LimitValue = r.LimitValue,
        Sense = r.Sense, Margin = r.Margin, GuardBand = r.GuardBand, Outcome = r.Outcome, IsLowerBound = r.IsLowerBound, AtHz = r.AtHz, Message = r.Message,
    }).ToList();
}
