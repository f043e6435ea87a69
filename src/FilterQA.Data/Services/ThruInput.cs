using FilterQA.Core.Sweeps;

namespace FilterQA.Data.Services;

/// <summary>A thru measured at a station: the file's bytes, the sweep read from them and its primary response.</summary>
public sealed record ThruInput(string Station, ReadOnlyMemory<byte> SweepBytes, Sweep Sweep, ResponseTrace Response,
    DateTimeOffset MeasuredAt, Actor Operator);
