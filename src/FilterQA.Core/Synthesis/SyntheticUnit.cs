using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Synthesis;

/// <summary>One synthetic unit of a demo lot.</summary>
/// <param name="Serial">Serial as printed on the unit, e.g. <c>S0001</c> (S and the index, at least four digits).</param>
/// <param name="SerialIndex">The index the serial was made from, 1 or more.</param>
/// <param name="Defect">The defect built into the unit, <see cref="DefectKind.None"/> for a good one.</param>
/// <param name="Sweep">Its synthetic two-port sweep (source format <see cref="SweepFormat.Synthetic"/>).</param>
public sealed record SyntheticUnit(string Serial, int SerialIndex, DefectKind Defect, Sweep Sweep);
