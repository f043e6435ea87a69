namespace FilterQA.Data.Services;

/// <summary>Who does something: an account id, the name printed on records, and whether they may approve overrides.</summary>
public sealed record Actor
{
    public Actor(string id, string name, bool isApprover = false)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(id);
        ArgumentException.ThrowIfNullOrWhiteSpace(name);
        Id = id;
        Name = name;
        IsApprover = isApprover;
    }

    public string Id { get; }

    public string Name { get; }

    public bool IsApprover { get; }
}
