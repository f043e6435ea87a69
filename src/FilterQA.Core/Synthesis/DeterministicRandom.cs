namespace FilterQA.Core.Synthesis;

/// <summary>
/// xoshiro256** (Blackman and Vigna, 2018) seeded through SplitMix64, with Box–Muller normals.
/// Our own generator rather than <see cref="Random"/>, whose algorithm may change between .NET versions.
/// A mutable struct: pass it by <c>ref</c>.
/// </summary>
/// <remarks>
/// The integer sequence is identical everywhere. Normals use <see cref="Math.Log(double)"/>, <see cref="Math.Sqrt"/>
/// and <see cref="Math.SinCos"/>; square root is exact by IEEE 754, the others could in principle differ in
/// the last bit between operating systems' maths libraries.
/// </remarks>
internal struct DeterministicRandom
{
    private ulong _s0, _s1, _s2, _s3;
    private double _spareNormal;
    private bool _hasSpare;

    public DeterministicRandom(ulong seed)
    {
        // SplitMix64 expands the seed into four words; it never yields the all-zero state xoshiro must avoid
        // for more than one word in a row, and the four outputs of a bijection cannot all be zero.
        ulong x = seed;
        _s0 = Next(ref x);
        _s1 = Next(ref x);
        _s2 = Next(ref x);
        _s3 = Next(ref x);
        _spareNormal = 0;
        _hasSpare = false;

        static ulong Next(ref ulong state)
        {
            state += 0x9E3779B97F4A7C15UL;
            return StableHash.Mix(state);
        }
    }

    /// <summary>Next 64 random bits.</summary>
    public ulong NextUInt64()
    {
        ulong result = RotateLeft(_s1 * 5, 7) * 9;
        ulong t = _s1 << 17;
        _s2 ^= _s0;
        _s3 ^= _s1;
        _s1 ^= _s2;
        _s0 ^= _s3;
        _s2 ^= t;
        _s3 = RotateLeft(_s3, 45);
        return result;
    }

    /// <summary>Uniform in [0, 1), 53 bits.</summary>
    public double NextDouble() => (NextUInt64() >> 11) * (1.0 / (1UL << 53));

    /// <summary>Uniform in (0, 1]: never zero, so its logarithm is finite.</summary>
    public double NextDoubleNonZero() => ((NextUInt64() >> 11) + 1) * (1.0 / (1UL << 53));

    /// <summary>Standard normal (mean 0, standard deviation 1), Box–Muller; the second value of each pair is kept for the next call.</summary>
    public double NextNormal()
    {
        if (_hasSpare)
        {
            _hasSpare = false;
            return _spareNormal;
        }
        double radius = Math.Sqrt(-2.0 * Math.Log(NextDoubleNonZero()));
        (double sin, double cos) = Math.SinCos(2.0 * Math.PI * NextDouble());
        _spareNormal = radius * sin;
        _hasSpare = true;
        return radius * cos;
    }

    /// <summary>
    /// Standard normal truncated to ±<paramref name="limit"/> by redrawing: the spreads of synthetic parts are
    /// Gaussian but bounded, so a good unit can never stray past a limit by a freak tail.
    /// </summary>
    public double NextTruncatedNormal(double limit = 4.0)
    {
        while (true)
        {
            double z = NextNormal();
            if (Math.Abs(z) <= limit)
            {
                return z;
            }
        }
    }

    /// <summary>Uniform angle in [0, 2π), radians.</summary>
    public double NextAngle() => 2.0 * Math.PI * NextDouble();

    private static ulong RotateLeft(ulong x, int k) => (x << k) | (x >> (64 - k));
}
