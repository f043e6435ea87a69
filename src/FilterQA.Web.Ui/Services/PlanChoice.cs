namespace FilterQA.Web.Ui.Services;

/// <summary>The kinds of sampling plan the new-lot form offers.</summary>
public enum PlanChoice
{
    /// <summary>MIL-STD-105E single sampling by inspection level and AQL.</summary>
    Standard,

    /// <summary>A zero-acceptance (c = 0) plan by LTPD and confidence.</summary>
    ZeroAcceptance,

    /// <summary>Every unit of the lot is tested.</summary>
    FullInspection,
}
