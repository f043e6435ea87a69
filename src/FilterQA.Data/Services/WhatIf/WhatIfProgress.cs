namespace FilterQA.Data.Services;

/// <summary>How far a what-if run has come: measurements judged again of the total found when the run began.</summary>
/// <param name="Evaluated">Measurements judged so far, 0 to <paramref name="Total"/>.</param>
/// <param name="Total">Measurements the run re-evaluates (each unit's counted measurement and its first measurement).</param>
public sealed record WhatIfProgress(int Evaluated, int Total);
