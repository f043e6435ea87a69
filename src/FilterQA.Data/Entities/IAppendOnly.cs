namespace FilterQA.Data.Entities;

/// <summary>
/// Marks a record that is written once and never edited or deleted: a correction is a new row
/// that points to the old one. <see cref="FilterQaDbContext"/> refuses changes to these in
/// SaveChanges, and database triggers refuse UPDATE and DELETE on their tables.
/// </summary>
public interface IAppendOnly;
