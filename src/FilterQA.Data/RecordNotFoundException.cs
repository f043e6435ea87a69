namespace FilterQA.Data;

/// <summary>A record named by its natural key (lot number, part number, station name, ...) does not exist.</summary>
public sealed class RecordNotFoundException : KeyNotFoundException
{
    public RecordNotFoundException(string message)
        : base(message)
    {
    }

    public RecordNotFoundException(string message, Exception innerException)
        : base(message, innerException)
    {
    }

    public RecordNotFoundException()
    {
    }
}
