namespace FilterQA.Web.Ui.Services;

/// <summary>One point of a limit line in the form: a frequency and a loss.</summary>
public sealed class PointForm
{
    /// <summary>The point's frequency (an offset or absolute, by the rule's anchor).</summary>
    public FormField Frequency { get; } = new(TemplateFieldSpecs.PointFrequency);

    /// <summary>The point's loss in dB (positive = attenuation).</summary>
    public FormField Loss { get; } = new(TemplateFieldSpecs.PointLoss);

    /// <summary>The reader's problems at the point's line.</summary>
    public List<string> Problems { get; } = [];
}
