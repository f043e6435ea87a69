using FilterQA.Core.Sweeps;

namespace FilterQA.Data.Services.Exports;

/// <summary>One stored raw sweep: the unit and attempt it belongs to, the original file name, and the original bytes (checked against their SHA-256).</summary>
public sealed record ExportSweep(string Serial, int Attempt, string FileName, SweepFormat Format, byte[] Bytes, string Sha256);
