using FilterQA.Data.Services;

namespace FilterQA.Web.Ui.Services;

/// <summary>Runs one what-if re-evaluation of a stored template revision; the page's runner calls it off the render thread.</summary>
public interface IWhatIfEngine
{
    /// <summary>Judges the part's stored measurements against the revision, reporting progress; throws <see cref="OperationCanceledException"/> when cancelled.</summary>
    Task<WhatIfReport> RunAsync(string partNumber, int revision, IProgress<WhatIfProgress> progress, CancellationToken cancellationToken);
}
