namespace FilterQA.Core.Sampling;

/// <summary>The plan a table lookup lands on after following arrows.</summary>
/// <param name="TableLetter">The code letter the lookup started from (from Table I).</param>
/// <param name="LetterUsed">The letter whose row holds the plan (differs from <paramref name="TableLetter"/> when an arrow was followed).</param>
/// <param name="SampleSize">n of <paramref name="LetterUsed"/> in the table used (units).</param>
/// <param name="AcceptanceNumber">Ac of the plan.</param>
/// <param name="RejectionNumber">Re of the plan.</param>
public readonly record struct TablePlan(CodeLetter TableLetter, CodeLetter LetterUsed, int SampleSize, int AcceptanceNumber, int RejectionNumber);
