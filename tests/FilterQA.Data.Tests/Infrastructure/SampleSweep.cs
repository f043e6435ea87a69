using FilterQA.Core.Sweeps;

namespace FilterQA.Data.Tests.Infrastructure;

/// <summary>A sweep file's bytes, the sweep read from them, and its primary response.</summary>
public sealed record SampleSweep(byte[] Bytes, Sweep Sweep, ResponseTrace Response);
