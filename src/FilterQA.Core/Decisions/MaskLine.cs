using System.Collections.Immutable;
using FilterQA.Core.Templates;

namespace FilterQA.Core.Decisions;

/// <summary>
/// One limit line of a template resolved to absolute frequencies for one unit, for charts:
/// a piecewise-linear boundary of loss (dB, positive = attenuation) against frequency (Hz).
/// </summary>
/// <param name="RuleId">The rule the line comes from.</param>
/// <param name="Boundary">Upper (maximum loss) or lower (minimum loss) boundary.</param>
/// <param name="FrequenciesHz">Corner frequencies, Hz, increasing.</param>
/// <param name="LossDb">Loss at each corner, dB (positive = attenuation), as long as <paramref name="FrequenciesHz"/>.</param>
public sealed record MaskLine(string RuleId, LimitBoundary Boundary, ImmutableArray<double> FrequenciesHz, ImmutableArray<double> LossDb);
