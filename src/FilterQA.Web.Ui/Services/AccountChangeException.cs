namespace FilterQA.Web.Ui.Services;

/// <summary>An account change was refused; the message names the field or rule that was not met.</summary>
public sealed class AccountChangeException : Exception
{
    public AccountChangeException()
    {
    }

    public AccountChangeException(string message)
        : base(message)
    {
    }

    public AccountChangeException(string message, Exception innerException)
        : base(message, innerException)
    {
    }
}
