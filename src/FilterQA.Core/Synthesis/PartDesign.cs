using System.Numerics;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Synthesis;

/// <summary>The physical model of one demo part: nominal values, unit-to-unit spread and defect values.</summary>
internal abstract class PartDesign
{
    /// <summary>Defects this part can be given.</summary>
    public abstract IReadOnlyList<DefectKind> Defects { get; }

    /// <summary>
    /// Draws one unit's parameters from <paramref name="parameters"/> and writes its noise-free S11, S21 and S22.
    /// Every parameter is drawn whatever the defect, in a fixed order, so a defective unit differs from the good
    /// unit of the same serial only in the parameter its defect changes.
    /// </summary>
    public abstract void Synthesise(FrequencyGrid grid, ref DeterministicRandom parameters, DefectKind defect,
        Span<Complex> s11, Span<Complex> s21, Span<Complex> s22);
}
