namespace FilterQA.Core.Synthesis;

/// <summary>
/// Hashes that never change between processes, machines or .NET versions, unlike
/// <see cref="string.GetHashCode()"/>, which is randomised per process.
/// </summary>
internal static class StableHash
{
    /// <summary>FNV-1a, 64 bit, over the UTF-16 code units of <paramref name="text"/>, then mixed.</summary>
    public static ulong Of(string text)
    {
        ulong hash = 14695981039346656037UL;
        foreach (char c in text)
        {
            hash ^= c;
            hash *= 1099511628211UL;
        }
        return Mix(hash);
    }

    /// <summary>Combines two 64-bit values so that neighbouring inputs give unrelated outputs.</summary>
    public static ulong Combine(ulong a, ulong b) => Mix(a ^ Mix(b + 0x9E3779B97F4A7C15UL));

    /// <summary>The SplitMix64 finaliser (Steele, Lea and Flood, 2014): a bijective 64-bit mixer.</summary>
    public static ulong Mix(ulong z)
    {
        z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL;
        z = (z ^ (z >> 27)) * 0x94D049BB133111EBUL;
        return z ^ (z >> 31);
    }
}
