namespace FilterQA.Reports.Pdf;

/// <summary>One row of a table: a text per column; <see cref="Alarm"/> prints it in the alarm colour (a failing rule, a non-conforming unit).</summary>
public sealed record TableRow(IReadOnlyList<string> Cells, bool Alarm = false);
