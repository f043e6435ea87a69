using FilterQA.Core.Decisions;
using FilterQA.Core.Formats;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;
using FilterQA.Data.Services;
using FilterQA.Web.Ui.Charts;

namespace FilterQA.Web.Ui.Services;

/// <summary>
/// The editor's live preview: the units picked (stored measurements of the part, read as the what-if reads them, or
/// uploaded sweep files) judged against the draft by the engine's own evaluator. One per circuit.
/// </summary>
public sealed class DraftPreview(PreviewSamples samples)
{
    /// <summary>At most this many units are previewed at once (each is judged on every change).</summary>
    public const int MaxSamples = 6;

    private readonly List<PreviewSample> _samples = [];

    /// <summary>The units picked, in the order they were added.</summary>
    public IReadOnlyList<PreviewSample> Samples => _samples;

    /// <summary>The part's latest stored measurements to pick from.</summary>
    public Task<IReadOnlyList<PreviewCandidate>> CandidatesAsync(string partNumber, CancellationToken cancellationToken = default) =>
        samples.CandidatesAsync(partNumber, 50, cancellationToken);

    /// <summary>Adds a stored measurement, read as <paramref name="draft"/> needs it.</summary>
    /// <exception cref="InvalidOperationException">Already <see cref="MaxSamples"/> units.</exception>
    public async Task AddStoredAsync(PreviewCandidate candidate, LimitTemplate draft, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(candidate);
        ArgumentNullException.ThrowIfNull(draft);
        EnsureRoom();
        if (_samples.Any(s => s.MeasurementId == candidate.MeasurementId))
        {
            return;
        }
        bool original = PreviewSamples.WhyOriginalNeeded(draft) is not null;
        MeasurementInput input = await samples.LoadAsync(candidate.MeasurementId, original, cancellationToken).ConfigureAwait(false);
        _samples.Add(new PreviewSample(FormattableString.Invariant($"{candidate.LotNumber} / {candidate.Serial} (attempt {candidate.Attempt})"),
            candidate.MeasurementId, input, original));
    }

    /// <summary>Adds an uploaded sweep file, taken as calibrated (no thru is applied).</summary>
    /// <exception cref="SweepReadException">The file cannot be read; the message names the line.</exception>
    /// <exception cref="InvalidOperationException">Already <see cref="MaxSamples"/> units.</exception>
    public void AddUploaded(string fileName, ReadOnlySpan<byte> content)
    {
        EnsureRoom();
        Sweep sweep = SweepFileReader.Read(content, fileName);
        _samples.Add(new PreviewSample(fileName + " (uploaded)", null, MeasurementInput.FromSweep(sweep), FromOriginalFile: true));
    }

    /// <summary>Removes a unit from the preview.</summary>
    public void Remove(PreviewSample sample) => _samples.Remove(sample);

    /// <summary>
    /// Judges every unit against <paramref name="draft"/>. A stored unit read from its compact trace is read again from
    /// its original file first when the draft now needs it (a return-loss rule, a resonator model).
    /// </summary>
    public async Task<IReadOnlyList<PreviewOutcome>> JudgeAsync(LimitTemplate draft, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(draft);
        if (PreviewSamples.WhyOriginalNeeded(draft) is not null)
        {
            for (int i = 0; i < _samples.Count; i++)
            {
                if (_samples[i] is { FromOriginalFile: false, MeasurementId: { } id } sample)
                {
                    _samples[i] = sample with { Input = await samples.LoadAsync(id, true, cancellationToken).ConfigureAwait(false), FromOriginalFile = true };
                }
            }
        }
        return _samples.Select(sample =>
        {
            UnitEvaluation evaluation = TemplateEvaluator.Evaluate(draft, sample.Input);
            return new PreviewOutcome(sample, evaluation, SweepChartBuilder.Build(sample.Input.Primary, evaluation.MaskLines));
        }).ToArray();
    }

    private void EnsureRoom()
    {
        if (_samples.Count >= MaxSamples)
        {
            throw new InvalidOperationException(FormattableString.Invariant($"the preview holds at most {MaxSamples} units; remove one first"));
        }
    }
}
