using FilterQA.Web.Ui.Services;

namespace FilterQA.Web.Ui.Tests.Services;

public sealed class SerialFromFileNameTests
{
    [Theory]
    [InlineData("TME-CF455-15_S0001.s2p", "S0001")]
    [InlineData("S0002.csv", "S0002")]
    [InlineData("lot VP-2611-0042/TME-XR24M-18_S0104.s1p", "S0104")]
    [InlineData(@"C:\sweeps\TME_SF70M_S0009.s2p", "S0009")]
    [InlineData("no-extension", "no-extension")]
    public void The_serial_is_the_name_after_its_last_underscore(string fileName, string serial) =>
        Assert.Equal(serial, SerialFromFileName.Extract(fileName));

    [Theory]
    [InlineData("PART_.s2p")]
    [InlineData(".s2p")]
    public void A_name_that_leaves_nothing_gives_no_serial(string fileName) => Assert.Null(SerialFromFileName.Extract(fileName));
}
