using System.Collections.Immutable;
using FilterQA.Core.Templates;
using FilterQA.Core.Templates.Rules;

namespace FilterQA.Core.Decisions;

/// <summary>
/// Chart lines for one unit, in absolute hertz and absolute loss (a relative limit has the unit's minimum loss added),
/// so they overlay the measured transmission: every limit line, and a two-point lower boundary across each stopband at
/// its minimum rejection. Lines that follow a measured centre the unit does not have are left out.
/// </summary>
internal static class MaskLines
{
    public static IReadOnlyList<MaskLine> Build(EvaluationContext c)
    {
        var lines = new List<MaskLine>();
        foreach (LimitRule rule in c.Template.Rules)
        {
            switch (rule)
            {
                case LimitLineRule line:
                    double reference = LimitLines.Reference(line.Anchor, c);
                    if (!double.IsFinite(reference))
                    {
                        break;
                    }
                    double offset = line.Reference == LossReference.Relative ? c.MinLossDb : 0;
                    var hz = ImmutableArray.CreateBuilder<double>(line.FrequenciesHz.Length);
                    var db = ImmutableArray.CreateBuilder<double>(line.FrequenciesHz.Length);
                    for (int i = 0; i < line.FrequenciesHz.Length; i++)
                    {
                        hz.Add(line.FrequenciesHz[i] + reference);
                        db.Add(line.LossDb[i] + offset);
                    }
                    lines.Add(new MaskLine(line.Id, line.Boundary, hz.MoveToImmutable(), db.MoveToImmutable()));
                    break;
                case StopbandRejectionRule stop when c.IsTransmission:
                    if (c.Resolve(stop.Band) is { } band)
                    {
                        double level = stop.MinimumDb + (stop.Reference == LossReference.Relative ? c.MinLossDb : 0);
                        lines.Add(new MaskLine(stop.Id, LimitBoundary.Lower, [band.StartHz, band.StopHz], [level, level]));
                    }
                    break;
            }
        }
        return lines;
    }
}
