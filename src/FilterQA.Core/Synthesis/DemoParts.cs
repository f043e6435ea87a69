using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Synthesis;

/// <summary>
/// The six part numbers of the invented demo scenario, with the models used to synthesise them.
/// Nominal values and spreads are typical of each family (data sheets and memory, see the design notes
/// beside each part) and sit well inside the scenario's limits; each defect value breaks its limit clearly.
/// </summary>
/// <remarks>
/// Demo data for screens, examples and load tests. Never use a demo part or a synthetic unit as the
/// expected value of a correctness test: those check the engine against published formulas and standards.
/// </remarks>
public static class DemoParts
{
    private static readonly DemoPart[] Parts =
    [
        Ceramic455(), CrystalFilter21M4(), Saw70M(), Saw162(), Resonator24M(), Trap92(),
    ];

    /// <summary>All demo parts, in the scenario's order.</summary>
    public static IReadOnlyList<DemoPart> All => Parts;

    /// <summary>The demo part with this exact part number (ordinal, case-sensitive).</summary>
    /// <exception cref="ArgumentNullException"><paramref name="partNumber"/> is null.</exception>
    /// <exception cref="ArgumentException">No demo part has that number; the message lists the known ones.</exception>
    public static DemoPart Get(string partNumber)
    {
        ArgumentNullException.ThrowIfNull(partNumber);
        foreach (DemoPart part in Parts)
        {
            if (string.Equals(part.PartNumber, partNumber, StringComparison.Ordinal))
            {
                return part;
            }
        }
        throw new ArgumentException(
            $"'{partNumber}' is not a demo part; known parts: {string.Join(", ", Parts.Select(p => p.PartNumber))}", nameof(partNumber));
    }

    // Centre ±1.5 kHz (σ 0.2 kHz, drift ±3.0 kHz so |offset| >= 2.2 kHz); 7-pole 0.5 dB Chebyshev, B 19 kHz:
    // 6 dB BW ≈ 19.8 kHz (limit >= 15), 40 dB BW ≈ 27.6 kHz (<= 30); IL 4.0 dB σ 0.3 (<= 6; defect 8.0);
    // feedthrough 58 dB down σ 1 (>= 35; defect 29 dB: a flat floor above 35 dB also keeps the response from
    // ever reaching 40 dB, so the 40 dB bandwidth cannot be measured on such a unit either).
    // Ceramic resonator Q ≈ 1 500 (memory). Specified in 1.5 kohm terminations.
    private static DemoPart Ceramic455() => new("TME-CF455-15", "455 kHz ceramic IF filter", DemoPartFamily.CeramicFilter, 455e3,
        FrequencyGrid.Linear(255e3, 655e3, 2001), 1500,
        new BandpassDesign(7, 0.5)
        {
            CentreHz = 455e3, CentreSigmaHz = 200, BandwidthHz = 19e3, BandwidthSigmaRelative = 0.008,
            InsertionLossDb = 4.0, InsertionLossSigmaDb = 0.3, UnloadedQ = 1500,
            FeedthroughRejectionDb = 58, FeedthroughSigmaDb = 1.0,
            ReturnLossDb = 14, ReturnLossSigmaDb = 1.0, StopbandReflectedShare = 0.9, PortDelayS = 0.5e-9,
            DriftHz = 3.0e3, DefectInsertionLossDb = 8.0, DefectFeedthroughRejectionDb = 29,
        });

    // 4-pole 0.3 dB Chebyshev, B 15.5 kHz: 3 dB BW ≈ 17.3 kHz (>= 15), 40 dB BW ≈ 42.5 kHz (<= 50);
    // IL 2.0 dB σ 0.15 (<= 3; defect 4.5); feedthrough 88 dB σ 1.5 (>= 70 beyond ±100 kHz; defect 62);
    // spurious at +70 kHz 75 dB σ 1.5 down (>= 60; defect 52) — between the skirt and the ±100 kHz
    // rejection window, so only the spurious rule sees it. Quartz Q 80 000. No centre limit: no drift defect.
    private static DemoPart CrystalFilter21M4() => new("TME-XF21M4-15", "21.4 MHz 4-pole crystal filter", DemoPartFamily.CrystalFilter, 21.4e6,
        FrequencyGrid.Linear(21.4e6 - 1.2e6, 21.4e6 + 1.2e6, 8001), 1000,
        new BandpassDesign(4, 0.3)
        {
            CentreHz = 21.4e6, CentreSigmaHz = 300, BandwidthHz = 15.5e3, BandwidthSigmaRelative = 0.008,
            InsertionLossDb = 2.0, InsertionLossSigmaDb = 0.15, UnloadedQ = 80_000,
            FeedthroughRejectionDb = 88, FeedthroughSigmaDb = 1.5,
            ReturnLossDb = 15, ReturnLossSigmaDb = 1.0, StopbandReflectedShare = 0.92, PortDelayS = 0.3e-9,
            Spurious = new SpuriousDesign(70e3, 2e3, 75, 1.5, 52),
            DefectInsertionLossDb = 4.5, DefectFeedthroughRejectionDb = 62,
        });

    // Transversal SAW: linear phase, delay 1.3 µs, triple-transit echo 50 dB σ 0.75 down. 5-pole 0.2 dB
    // Chebyshev magnitude, B 1.15 MHz: 1 dB BW ≈ 1.20 MHz (>= 1.0), 3 dB BW ≈ 1.26 MHz (1.1–1.4);
    // IL 17 dB σ 0.4 (<= 22; defect 25); feedthrough 56 dB σ 0.75 (>= 45 beyond ±3 MHz; defect 40).
    // Group-delay ripple from echo and feedthrough ≈ 2·a·Δτ: about 20 ns good, up to 60 ns with the defect
    // floor at its strongest (limit 60 ns). Return loss 14 dB σ 0.8 in band (>= 10).
    private static DemoPart Saw70M() => new("TME-SF70M-1M2", "70 MHz SAW IF filter", DemoPartFamily.SawFilter, 70e6,
        FrequencyGrid.Linear(60e6, 80e6, 2001), 50,
        new BandpassDesign(5, 0.2)
        {
            LinearPhase = true,
            CentreHz = 70e6, CentreSigmaHz = 15e3, BandwidthHz = 1.15e6, BandwidthSigmaRelative = 0.006,
            InsertionLossDb = 17, InsertionLossSigmaDb = 0.4, DelayS = 1.3e-6, EchoRejectionDb = 50, EchoSigmaDb = 0.75,
            FeedthroughRejectionDb = 56, FeedthroughSigmaDb = 0.75,
            ReturnLossDb = 14, ReturnLossSigmaDb = 0.8, StopbandReflectedShare = 0.85, PortDelayS = 0.5e-9,
            DefectInsertionLossDb = 25, DefectFeedthroughRejectionDb = 40,
        });

    // Resonator-type SAW (minimum phase), delay 0.35 µs, Q 1 500. 4-pole 0.3 dB Chebyshev, B 2.3 MHz:
    // 3 dB BW ≈ 2.52 MHz (>= 2.0), ≈ 53 dB down at 157.5 MHz; IL 2.3 dB σ 0.15 (<= 3.5; defect 5.0);
    // feedthrough 55 dB σ 1.5 (>= 40 / 45; defect 32).
    private static DemoPart Saw162() => new("TME-SF162-AIS", "162.0 MHz SAW front-end filter", DemoPartFamily.SawFilter, 162e6,
        FrequencyGrid.Linear(142e6, 190e6, 2401), 50,
        new BandpassDesign(4, 0.3)
        {
            CentreHz = 162e6, CentreSigmaHz = 30e3, BandwidthHz = 2.3e6, BandwidthSigmaRelative = 0.008,
            InsertionLossDb = 2.3, InsertionLossSigmaDb = 0.15, UnloadedQ = 1500, DelayS = 0.35e-6,
            FeedthroughRejectionDb = 55, FeedthroughSigmaDb = 1.5,
            ReturnLossDb = 14, ReturnLossSigmaDb = 1.0, StopbandReflectedShare = 0.9, PortDelayS = 0.3e-9,
            DefectInsertionLossDb = 5.0, DefectFeedthroughRejectionDb = 32,
        });

    // Small SMD 24 MHz fundamental (memory): fs σ 4 ppm (±20; drift ±45 ppm), R1 18 ohm σ 2.5 (<= 40;
    // defect 50 σ 1, which still leaves Q >= 31 000 so only the R1 rule fails), C1 3.5 fF σ 3 %,
    // C0 2.4 pF σ 0.1 (<= 5); Q ≈ 105 000 (>= 30 000). Unwanted modes +65/+150/+310 kHz at 450/700/1100 ohm:
    // >= 8 dB below the main response (>= 6; defect: the first mode 2 dB below).
    // In the 100 ohm fixture QL ≈ 16 000, fs/QL ≈ 1.5 kHz: the 50 Hz segment puts ~30 points inside it.
    private static DemoPart Resonator24M() => new("TME-XR24M-18", "24.000 MHz AT-cut crystal resonator, fundamental", DemoPartFamily.CrystalResonator, 24e6,
        ResonatorGrid(24e6), 50,
        new ResonatorDesign
        {
            FsHz = 24e6, FsSigmaPpm = 4, R1Ohm = 18, R1SigmaOhm = 2.5, C1F = 3.5e-15, C1SigmaRelative = 0.03,
            C0F = 2.4e-12, C0SigmaF = 0.1e-12,
            Modes =
            [
                new UnwantedModeDesign(65e3, 3e3, 450, 0.1, 2),
                new UnwantedModeDesign(150e3, 5e3, 700, 0.1, 3),
                new UnwantedModeDesign(310e3, 8e3, 1100, 0.1, 4),
            ],
            DriftPpm = 45, DefectR1Ohm = 50, DefectR1SigmaOhm = 1, StrongModeBelowDb = 2,
        });

    // Notch 92 MHz, √(L/C) = 330 ohm, coil Q 400 (R ≈ 0.83 ohm σ 6 %): depth ≈ 29.5 dB (>= 25; defect R 3.2 ohm
    // → <= 21 dB); L and C σ 0.3 % → notch within ±1.1 MHz (±2; drift −3.8 MHz, keeping √(L/C), so the
    // 80 MHz loss stays below 1 dB); loss ≈ 0.3 dB at 80 MHz, 0.4 dB at 104 MHz (<= 1; defect √(L/C) = 120 ohm
    // → ≈ 1.9 and 2.4 dB).
    private static DemoPart Trap92() => new("TME-LC92-TRAP", "92 MHz series-LC trap (shunt to ground)", DemoPartFamily.LcTrap, 92e6,
        FrequencyGrid.Linear(60e6, 124e6, 1601), 50,
        new TrapDesign
        {
            NotchHz = 92e6, CharacteristicOhm = 330, Q = 400, LSigmaRelative = 0.003, CSigmaRelative = 0.003, RSigmaRelative = 0.06,
            DriftHz = -3.8e6, DefectROhm = 3.2, DefectCharacteristicOhm = 120,
        });

    /// <summary>
    /// Segments: fs − 150 kHz … fs − 10 kHz every 1 kHz; fs ± 10 kHz every 50 Hz; fs + 10 kHz … fs + 550 kHz
    /// every 250 Hz (fp and the unwanted modes; the demo template's span reaches fs + 550 kHz). Steps are whole hertz so the grid is exact.
    /// </summary>
    private static FrequencyGrid ResonatorGrid(double nominalHz)
    {
        var hz = new List<double>(2700);
        for (double f = nominalHz - 150e3; f < nominalHz - 10e3; f += 1e3)
        {
            hz.Add(f);
        }
        for (double f = nominalHz - 10e3; f < nominalHz + 10e3; f += 50)
        {
            hz.Add(f);
        }
        for (double f = nominalHz + 10e3; f <= nominalHz + 550e3; f += 250)
        {
            hz.Add(f);
        }
        return FrequencyGrid.Own([.. hz]);
    }
}
