using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Synthesis;

/// <summary>
/// A part number of the invented demo scenario, with the frequency grid its synthetic sweeps use.
/// The physical model behind it is internal to the synthesiser. Immutable; get instances from <see cref="DemoParts"/>.
/// </summary>
/// <remarks>Demo data only: nothing about a demo part may serve as the expected value of a correctness test.</remarks>
public sealed class DemoPart
{
    internal DemoPart(string partNumber, string description, DemoPartFamily family, double nominalHz,
        FrequencyGrid grid, double referenceOhm, PartDesign design)
    {
        PartNumber = partNumber;
        Description = description;
        Family = family;
        NominalHz = nominalHz;
        Grid = grid;
        ReferenceOhm = referenceOhm;
        Design = design;
        ReferenceOhms = [referenceOhm, referenceOhm];
    }

    /// <summary>Part number, e.g. <c>TME-CF455-15</c>.</summary>
    public string PartNumber { get; }

    /// <summary>Plain description of the device, e.g. "455 kHz ceramic IF filter".</summary>
    public string Description { get; }

    /// <summary>Kind of device, which decides the physical model.</summary>
    public DemoPartFamily Family { get; }

    /// <summary>Nominal centre, series resonance or notch frequency, Hz.</summary>
    public double NominalHz { get; }

    /// <summary>
    /// Frequencies of every synthetic sweep of this part (network and power traces alike). Uniform for the
    /// filters and the trap; segmented for the crystal resonator (dense around fs, coarser below, medium up to
    /// fs + 550 kHz for the unwanted modes), as a network analyser's segment sweep would be.
    /// </summary>
    public FrequencyGrid Grid { get; }

    /// <summary>
    /// Reference impedance of both ports of the synthetic S-parameters, ohm: the terminations the part is
    /// specified in (1 500 ohm for the ceramic filter, 1 000 ohm for the crystal filter, otherwise 50 ohm).
    /// </summary>
    public double ReferenceOhm { get; }

    /// <summary>Defects this part can be given; <see cref="DefectKind.None"/> is always allowed and not listed.</summary>
    public IReadOnlyList<DefectKind> Defects => Design.Defects;

    internal PartDesign Design { get; }

    /// <summary>Both ports' reference impedances, shared by every unit (never mutated: NetworkData only exposes a read-only span).</summary>
    internal double[] ReferenceOhms { get; }

    /// <inheritdoc/>
    public override string ToString() => PartNumber;
}
