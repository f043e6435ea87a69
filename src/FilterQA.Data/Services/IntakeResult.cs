using FilterQA.Core.Decisions;

namespace FilterQA.Data.Services;

/// <summary>What a stored submission gave: the stored measurement (with the lot's new summary) and the full evaluation.</summary>
public sealed record IntakeResult(StoredMeasurement Stored, UnitEvaluation Evaluation, ThruInfo? ThruApplied);
