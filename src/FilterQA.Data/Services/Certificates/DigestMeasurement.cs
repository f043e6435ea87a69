using FilterQA.Core.Decisions;
using FilterQA.Data.Entities;

namespace FilterQA.Data.Services.Certificates;

/// <summary>The fields of one measurement that enter <see cref="LotDataDigest"/>, with its rule results.</summary>
internal sealed record DigestMeasurement(string Serial, int Attempt, bool CountsForLot, UnitVerdict Verdict, string RawSha256, IReadOnlyList<RuleResultRecord> Rules);
