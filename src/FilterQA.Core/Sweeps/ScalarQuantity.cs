namespace FilterQA.Core.Sweeps;

/// <summary>What the dB numbers of a <see cref="ScalarTrace"/> are.</summary>
public enum ScalarQuantity
{
    /// <summary>A ratio of two amplitudes (a gain, 20·log10|b/a|): negative where the part loses power.</summary>
    GainDb,

    /// <summary>An absolute power in dBm, as a spectrum analyser reads it; needs a thru to become a gain.</summary>
    PowerDbm,
}
