namespace FilterQA.Data;

/// <summary>
/// A storage rule was broken: an append-only record was edited, a released template revision
/// changed, a lot's template revision changed after testing began, or a lot operation is not
/// allowed in the lot's state. The message names the record and the rule.
/// </summary>
public sealed class StorageRuleException : InvalidOperationException
{
    public StorageRuleException(string message)
        : base(message)
    {
    }

    public StorageRuleException(string message, Exception innerException)
        : base(message, innerException)
    {
    }

    public StorageRuleException()
    {
    }
}
