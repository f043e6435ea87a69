using FilterQA.Core.Decisions;
using FilterQA.Data.Services;
using FilterQA.Web.Ui.Charts;

namespace FilterQA.Web.Ui.Services;

/// <summary>Everything the lot page shows, read in one go.</summary>
/// <param name="Summary">The lot row's summary (plan, counts, disposition).</param>
/// <param name="Statistics">Yield, Pareto of failing rules and a summary per rule.</param>
/// <param name="Units">The sample's units in order.</param>
/// <param name="Envelope">Min/max loss of every counted sweep per frequency bin.</param>
/// <param name="MaskLines">Limit lines for the overlay; empty when none can be placed.</param>
/// <param name="MaskNote">How the limit lines were placed, or why there are none.</param>
/// <param name="CertificateNumber">The signed certificate of conformance, when there is one (the lot's record is then final).</param>
public sealed record LotPage(LotSummary Summary, LotStatistics Statistics, IReadOnlyList<UnitRow> Units, LossEnvelope Envelope,
    IReadOnlyList<MaskLine> MaskLines, string MaskNote, string? CertificateNumber = null);
