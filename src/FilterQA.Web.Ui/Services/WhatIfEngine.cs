using FilterQA.Core.Templates;
using FilterQA.Data.Services;

namespace FilterQA.Web.Ui.Services;

/// <summary>The what-if of the storage: the revision read from the catalog, then <see cref="WhatIfService.ReevaluateAsync"/>.</summary>
public sealed class WhatIfEngine(TemplateCatalog templates, WhatIfService whatIf) : IWhatIfEngine
{
    /// <summary>
    /// Progress every 20 measurements: often enough for the bar to move on a small part, and the runner lets at most
    /// a few redraws a second through on a large one.
    /// </summary>
    public const int ProgressInterval = 20;

    /// <inheritdoc/>
    public async Task<WhatIfReport> RunAsync(string partNumber, int revision, IProgress<WhatIfProgress> progress, CancellationToken cancellationToken)
    {
        LimitTemplate draft = await templates.LoadAsync(partNumber, revision, cancellationToken).ConfigureAwait(false);
        // Leave a core for the circuits and the bench: the what-if is a background job.
        var options = new WhatIfOptions { ProgressInterval = ProgressInterval, MaxDegreeOfParallelism = Math.Max(1, Environment.ProcessorCount - 1) };
        return await whatIf.ReevaluateAsync(partNumber, draft, progress, options, cancellationToken).ConfigureAwait(false);
    }
}
