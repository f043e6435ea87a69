using System.Numerics;
using FilterQA.Core.Formats.Delimited;
using FilterQA.Core.Sweeps;

namespace FilterQA.Core.Tests.Formats.Delimited;

// Round-trip exactness rests on the "R" format: .NET Core 3.0+ prints the shortest string that parses
// back to the same double (IEEE 754 round-trip), and the reader parses it with one correct rounding.
// So the comparisons below are exact (bit-for-bit equal values), no tolerance.
public sealed class DelimitedTextWriterTests
{
    private static string Write(Sweep sweep)
    {
        using var text = new StringWriter();
        DelimitedTextWriter.Write(sweep, text);
        return text.ToString();
    }

    private static Sweep ReadBack(string text) => DelimitedTextReader.Read(DelimitedTestFiles.Bytes(text), "round-trip.csv");

    [Fact]
    public void Gain_trace_with_phase_round_trips_exactly()
    {
        var random = new Random(4711);
        var hz = new double[200];
        var gain = new double[200];
        var phase = new double[200];
        for (int i = 0; i < hz.Length; i++)
        {
            hz[i] = 10.6e6 + i * 1234.567891234 + random.NextDouble();
            gain[i] = -80 * random.NextDouble();
            phase[i] = 360 * random.NextDouble() - 180;
        }
        var source = new SweepSource("dut.csv", SweepFormat.Synthetic, "", ["bench 3", "lot 2406"], []);
        Sweep sweep = Sweep.FromScalar(ScalarTrace.Create(FrequencyGrid.FromHz(hz), ScalarQuantity.GainDb, gain, phase), source);

        Sweep back = ReadBack(Write(sweep));

        Assert.Equal(hz, back.Grid.Hz.ToArray());
        Assert.Equal(gain, back.Scalar!.LevelDb.ToArray());
        Assert.Equal(phase, back.Scalar.PhaseDeg.ToArray());
        Assert.Equal(ScalarQuantity.GainDb, back.Scalar.Quantity);
        Assert.Equal(["bench 3", "lot 2406"], back.Source.Notes);
    }

    [Fact]
    public void Power_trace_round_trips_with_its_quantity_and_header()
    {
        double[] hz = [69e6, 69.5e6, 70e6];
        double[] dbm = [-61.123456789012345, -10.000000000000002, -5e-320];
        Sweep sweep = Sweep.FromScalar(ScalarTrace.Create(FrequencyGrid.FromHz(hz), ScalarQuantity.PowerDbm, dbm), SweepSource.Of("p.csv", SweepFormat.Synthetic));

        string text = Write(sweep);
        Sweep back = ReadBack(text);

        Assert.StartsWith("frequency_hz,power_dbm\n", text, StringComparison.Ordinal);
        Assert.Equal(ScalarQuantity.PowerDbm, back.Scalar!.Quantity);
        Assert.Equal(dbm, back.Scalar.LevelDb.ToArray());
    }

    [Fact]
    public void Two_port_network_is_written_as_S21_gain_and_phase()
    {
        // S21 = 0.5∠−90°: 20·log10(0.5) = −6.0206 dB (definition of dB of an amplitude ratio), phase −90°.
        var grid = FrequencyGrid.FromHz([1e6, 2e6]);
        var s = new Complex[2, 2, 2];
        for (int f = 0; f < 2; f++)
        {
            s[f, 0, 0] = new Complex(0.1, 0);
            s[f, 1, 0] = Complex.FromPolarCoordinates(0.5, -Math.PI / 2);
            s[f, 0, 1] = s[f, 1, 0];
            s[f, 1, 1] = new Complex(0.1, 0);
        }
        Sweep sweep = Sweep.FromNetwork(NetworkData.Create(grid, s, [50.0, 50.0]), SweepSource.Of("dut.s2p", SweepFormat.Touchstone1));

        string text = Write(sweep);
        Sweep back = ReadBack(text);
        string again = Write(back);

        Assert.StartsWith("frequency_hz,s21_db,s21_phase_deg\n", text, StringComparison.Ordinal);
        // Tolerance 1e-12 dB / 1e-12 deg: a few ulps of log10 and atan2 in binary64.
        Assert.Equal(20 * Math.Log10(0.5), back.Scalar!.LevelDb[0], 1e-12);
        Assert.Equal(-90.0, back.Scalar.PhaseDeg[0], 1e-12);
        // Written numbers read back exactly, so writing the read-back scalar trace gives the same rows
        // (only the header differs: the read-back sweep is a scalar gain trace).
        Assert.Equal(text.Split('\n')[1..], again.Split('\n')[1..]);
        Assert.StartsWith("frequency_hz,gain_db,phase_deg\n", again, StringComparison.Ordinal);
    }

    [Fact]
    public void One_port_network_is_written_as_S11()
    {
        var grid = FrequencyGrid.FromHz([1e6]);
        var s = new Complex[1, 1, 1];
        s[0, 0, 0] = new Complex(0.316227766016838, 0);
        Sweep sweep = Sweep.FromNetwork(NetworkData.Create(grid, s, [50.0]), SweepSource.Of("x.s1p", SweepFormat.Touchstone1));

        string text = Write(sweep);

        Assert.StartsWith("frequency_hz,s11_db,s11_phase_deg\n", text, StringComparison.Ordinal);
        // |Γ| = 0.3162 is 10 dB return loss (DOMAIN section 9, example 11): S11 = −10 dB within 1e-12 dB.
        Assert.Equal(-10.0, ReadBack(text).Scalar!.LevelDb[0], 1e-12);
    }
}
