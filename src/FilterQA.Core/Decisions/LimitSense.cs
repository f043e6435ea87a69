namespace FilterQA.Core.Decisions;

/// <summary>Which side of the limit is good.</summary>
public enum LimitSense
{
    /// <summary>The value must not exceed the limit (a maximum).</summary>
    AtMost,

    /// <summary>The value must not fall below the limit (a minimum).</summary>
    AtLeast,
}
