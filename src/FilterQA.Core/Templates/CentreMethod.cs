namespace FilterQA.Core.Templates;

/// <summary>How a centre frequency is computed from the two band edges fL and fU at a level.</summary>
public enum CentreMethod
{
    /// <summary>(fL + fU) / 2: the usual definition for crystal, ceramic and SAW parts.</summary>
    ArithmeticMean,

    /// <summary>√(fL·fU): used for wideband LC parts.</summary>
    GeometricMean,
}
