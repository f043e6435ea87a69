using FilterQA.Core.Statistics;

namespace FilterQA.Web.Ui.Services;

/// <summary>One rule's measured values in one lot (counted measurements): moments, the lot's limits, capability (Ppk from the overall s).</summary>
public sealed record ParameterLot(string LotNumber, DateTimeOffset CreatedAt, SampleMoments Moments, SpecLimits? Limits, CapabilityIndices? Capability,
    string? CapabilityNote);
