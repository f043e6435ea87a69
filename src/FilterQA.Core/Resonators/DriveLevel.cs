using System.Globalization;

namespace FilterQA.Core.Resonators;

/// <summary>Power a resonator dissipates during a measurement, to compare against its rated drive level.</summary>
public static class DriveLevel
{
    /// <summary>
    /// Power dissipated in R1 at series resonance in a series-through fixture (source and load Z0 each):
    /// P = 4·Z0·R1·Pav/(R1 + 2·Z0)², which is at most Pav/2 (reached at R1 = 2·Z0).
    /// </summary>
    /// <param name="availablePowerW">Available source power, W; finite, ≥ 0.</param>
    /// <param name="r1Ohm">Motional resistance, ohm; finite, ≥ 0.</param>
    /// <param name="referenceOhm">Port impedance Z0, ohm; finite, &gt; 0.</param>
    /// <returns>Dissipated power, W.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is NaN, infinite or outside its range.</exception>
    public static double DissipatedW(double availablePowerW, double r1Ohm, double referenceOhm)
    {
        if (!double.IsFinite(availablePowerW) || availablePowerW < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(availablePowerW), availablePowerW, "available power must be finite and >= 0 W");
        }
        if (!double.IsFinite(r1Ohm) || r1Ohm < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(r1Ohm), r1Ohm, "R1 must be finite and >= 0 ohm");
        }
        if (!double.IsFinite(referenceOhm) || referenceOhm <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(referenceOhm), referenceOhm, "Z0 must be finite and > 0 ohm");
        }
        double total = r1Ohm + 2 * referenceOhm;
        return 4 * referenceOhm * r1Ohm * availablePowerW / (total * total);
    }

    /// <summary><see cref="DissipatedW"/> with the available power given in dBm (P = 1 mW·10^(dBm/10)).</summary>
    /// <param name="availableDbm">Available source power, dBm; finite, at most +100 dBm.</param>
    /// <param name="r1Ohm">Motional resistance, ohm; finite, ≥ 0.</param>
    /// <param name="referenceOhm">Port impedance Z0, ohm; finite, &gt; 0.</param>
    /// <returns>Dissipated power, W.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is NaN, infinite or outside its range.</exception>
    public static double DissipatedFromDbmW(double availableDbm, double r1Ohm, double referenceOhm)
    {
        if (!double.IsFinite(availableDbm) || availableDbm > 100)
        {
            throw new ArgumentOutOfRangeException(nameof(availableDbm), availableDbm,
                string.Create(CultureInfo.InvariantCulture, $"available power must be finite and at most 100 dBm"));
        }
        return DissipatedW(1e-3 * Math.Pow(10, availableDbm / 10), r1Ohm, referenceOhm);
    }
}
