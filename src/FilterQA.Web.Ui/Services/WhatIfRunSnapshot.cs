using FilterQA.Data.Services;

namespace FilterQA.Web.Ui.Services;

/// <summary>
/// What the page shows of a run at one moment, replaced whole (never changed in place) so the render thread reads a
/// consistent picture while the run's thread moves on. <see cref="Report"/> is set only for a finished run.
/// </summary>
public sealed record WhatIfRunSnapshot(WhatIfRunState State, string? PartNumber, int? Revision, WhatIfProgress? Progress, WhatIfReport? Report, string? Problem)
{
    /// <summary>Before any run.</summary>
    public static WhatIfRunSnapshot Idle { get; } = new(WhatIfRunState.Idle, null, null, null, null, null);

    /// <summary>Share judged, 0..1; 0 before the first report.</summary>
    public double Fraction => Progress is { Total: > 0 } p ? Math.Clamp((double)p.Evaluated / p.Total, 0, 1) : 0;
}
