using FilterQA.Core.Decisions;
using FilterQA.Core.Sweeps;

namespace FilterQA.Data.Services;

/// <summary>
/// One stored measurement as the what-if reads it: ids, the recorded verdict, what its thru age needs, the compact
/// trace, and (only when the template needs more than the trace) the original file.
/// </summary>
internal sealed record WhatIfRow(long Id, long LotId, int Attempt, bool IsCounted, string Serial, UnitVerdict Verdict, DateTimeOffset MeasuredAt,
    long? ThruReferenceId, ResponsePath Path, byte[] Trace, string FileName, byte[]? RawCompressed, long RawLength, string RawSha256);
