namespace FilterQA.Data.Services;

/// <summary>
/// A sweep was not taken for testing because the bench is not ready for it (no thru, an expired thru, a lot
/// that is closed). Nothing was stored; the message says what to do.
/// </summary>
public sealed class IntakeRefusedException : Exception
{
    public IntakeRefusedException(string message) : base(message)
    {
    }

    public IntakeRefusedException(string message, Exception innerException) : base(message, innerException)
    {
    }

    public IntakeRefusedException()
    {
    }
}
