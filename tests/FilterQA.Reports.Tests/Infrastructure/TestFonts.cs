using FilterQA.Reports.Pdf;

namespace FilterQA.Reports.Tests.Infrastructure;

public static class TestFonts
{
    public static ReportFonts Default => ReportFonts.Load();
}
