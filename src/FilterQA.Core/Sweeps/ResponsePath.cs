namespace FilterQA.Core.Sweeps;

/// <summary>Which path of the device a <see cref="ResponseTrace"/> describes.</summary>
public enum ResponsePath
{
    /// <summary>Through the device, port 1 to port 2 (S21, or a scalar trace).</summary>
    Transmission,

    /// <summary>Reflected at port 1 (S11).</summary>
    InputReflection,

    /// <summary>Reflected at port 2 (S22).</summary>
    OutputReflection,
}
