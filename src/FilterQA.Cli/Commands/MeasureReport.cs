using FilterQA.Core.Measurement;
using FilterQA.Core.Resonators;
using FilterQA.Core.Sweeps;

namespace FilterQA.Cli.Commands;

/// <summary>Everything <c>measure</c> prints, whatever the output form.</summary>
internal sealed record MeasureReport(FrequencyGrid Grid, FilterMeasurement Filter, ResonatorMeasurement? Resonator, IReadOnlyList<string> Warnings);
