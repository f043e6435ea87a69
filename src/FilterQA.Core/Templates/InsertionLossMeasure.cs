namespace FilterQA.Core.Templates;

/// <summary>Where an insertion-loss rule reads the loss.</summary>
public enum InsertionLossMeasure
{
    /// <summary>The smallest loss of the main trace (the passband minimum).</summary>
    MinimumLoss,

    /// <summary>The loss at the template's nominal frequency.</summary>
    AtNominal,

    /// <summary>The loss at a frequency the rule states.</summary>
    AtFrequency,
}
