namespace FilterQA.Reports.Tests.Infrastructure;

/// <summary>SI prefixes (BIPM, The International System of Units, 9th edition, table 7): what one printed unit is in the SI unit.</summary>
public static class SiUnits
{
    public static double SiPer(string printedUnit) => printedUnit switch
    {
        "Hz" or "dB" or "ppm" or "ohm" or "ratio" or "s" or "F" or "H" => 1,
        "kHz" => 1e3,
        "MHz" => 1e6,
        "GHz" => 1e9,
        "ms" => 1e-3,
        "µs" => 1e-6,
        "ns" => 1e-9,
        "pF" => 1e-12,
        "fF" => 1e-15,
        "mH" => 1e-3,
        _ => throw new ArgumentException($"unit '{printedUnit}' is not in the test's table", nameof(printedUnit)),
    };
}
