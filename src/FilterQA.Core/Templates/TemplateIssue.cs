namespace FilterQA.Core.Templates;

/// <summary>
/// One reason a set of template fields cannot form a template. <see cref="Field"/> names the field in the
/// text format's terms ("author", "rules[2].kind", "sweep.needs-phase") so the reader can point at its line.
/// </summary>
internal sealed record TemplateIssue(string Field, string Message);
