namespace FilterQA.Web.Ui.Services;

/// <summary>Which numbers a quantity or integer field accepts, checked as it is typed.</summary>
public enum FieldSign
{
    /// <summary>Any finite number (an offset from the nominal or measured centre may be negative).</summary>
    Any,

    /// <summary>Zero or more.</summary>
    NonNegative,

    /// <summary>More than zero.</summary>
    Positive,
}
