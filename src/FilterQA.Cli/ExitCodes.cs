namespace FilterQA.Cli;

/// <summary>Exit codes shared by the commands (each command's usage text says which it uses).</summary>
public static class ExitCodes
{
    /// <summary>Done; for <c>check</c>: every unit is go.</summary>
    public const int Success = 0;

    /// <summary>A usage error; for <c>check</c> also: a unit is no-go or not verifiable.</summary>
    public const int Usage = 1;

    /// <summary>For <c>check</c>: at least one unit is no-go or not verifiable.</summary>
    public const int Rejected = 1;

    /// <summary>An input file (sweep, thru, floor, template) cannot be read or used.</summary>
    public const int BadInput = 2;
}
