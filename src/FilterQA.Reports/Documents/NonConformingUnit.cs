namespace FilterQA.Reports.Documents;

/// <summary>A unit whose counted measurement is not go, with the rules that block it.</summary>
public sealed record NonConformingUnit(string LotNumber, string Serial, int Attempt, string Verdict, IReadOnlyList<RuleLine> FailingRules);
