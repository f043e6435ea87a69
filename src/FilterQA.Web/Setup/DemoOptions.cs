namespace FilterQA.Web.Setup;

/// <summary>The "Demo" configuration section.</summary>
public sealed class DemoOptions
{
    /// <summary>Configuration section name.</summary>
    public const string Section = "Demo";

    /// <summary>Load the invented demo scenario (accounts, stations, templates, lots) once, at first start. On in Development.</summary>
    public bool Seed { get; set; }

    /// <summary>Folder of the demo limit templates (*.yaml); empty = limit-templates/ of the repository above the content root.</summary>
    public string? TemplatesFolder { get; set; }
}
