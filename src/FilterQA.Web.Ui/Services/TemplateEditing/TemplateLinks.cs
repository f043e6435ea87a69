using System.Globalization;
using FilterQA.Core.Templates;

namespace FilterQA.Web.Ui.Services;

/// <summary>The addresses of the template pages and file (one place, as the pages link to each other).</summary>
public static class TemplateLinks
{
    /// <summary>The part's page.</summary>
    public static string Part(string partNumber) => "templates/" + Uri.EscapeDataString(partNumber);

    /// <summary>The draft editor.</summary>
    public static string Edit(string partNumber, int revision) => Part(partNumber) + "/" + revision.ToString(CultureInfo.InvariantCulture) + "/edit";

    /// <summary>The release page of a draft.</summary>
    public static string Release(string partNumber, int revision) => Part(partNumber) + "/" + revision.ToString(CultureInfo.InvariantCulture) + "/release";

    /// <summary>The rule-by-rule difference of two revisions.</summary>
    public static string Diff(string partNumber, int from, int to) =>
        Part(partNumber) + string.Create(CultureInfo.InvariantCulture, $"/diff?from={from}&to={to}");

    /// <summary>The part's reference units.</summary>
    public static string ReferenceUnits(string partNumber) => Part(partNumber) + "/reference-units";

    /// <summary>The revision's text as a download.</summary>
    public static string File(string partNumber, int revision) => "/" + Part(partNumber) + "/" + revision.ToString(CultureInfo.InvariantCulture) + "/file";

    /// <summary>The device kind in words.</summary>
    public static string DeviceWords(DeviceKind device) => device switch
    {
        DeviceKind.BandpassFilter => "band-pass filter",
        DeviceKind.BandStop => "band-stop filter",
        _ => "resonator",
    };
}
