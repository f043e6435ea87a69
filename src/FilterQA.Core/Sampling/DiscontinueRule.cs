namespace FilterQA.Core.Sampling;

/// <summary>When sampling inspection is discontinued while on tightened inspection.</summary>
public enum DiscontinueRule
{
    /// <summary>ANSI/ASQ Z1.4 and ISO 2859-1: 5 lots rejected (cumulative) during one stretch of tightened inspection. The default.</summary>
    FiveRejectedOnTightened,

    /// <summary>MIL-STD-105E: 10 consecutive lots remain on tightened inspection.</summary>
    TenConsecutiveOnTightened,
}
