namespace FilterQA.Core.Decisions;

/// <summary>The go/no-go statement for one measured unit.</summary>
public enum UnitVerdict
{
    /// <summary>Every rule passes under the template's decision rule.</summary>
    Go,

    /// <summary>At least one rule fails under the template's decision rule.</summary>
    NoGo,

    /// <summary>No rule fails, but at least one cannot be verified from this sweep: the unit is not passed.</summary>
    NotVerifiable,
}
