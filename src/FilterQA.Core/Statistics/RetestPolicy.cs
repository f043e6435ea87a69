namespace FilterQA.Core.Statistics;

/// <summary>
/// How many retests a unit may have: its final result is that of its last measurement within the
/// first 1 + <see cref="MaxRetests"/> measurements; later measurements do not count (and are
/// reported as beyond policy).
/// </summary>
public sealed record RetestPolicy
{
    /// <summary>Makes a policy.</summary>
    /// <param name="maxRetests">Retests allowed after the first measurement, at least 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">Negative.</exception>
    public RetestPolicy(int maxRetests)
    {
        if (maxRetests < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(maxRetests), maxRetests, "the number of retests allowed must not be negative");
        }
        MaxRetests = maxRetests;
    }

    /// <summary>No retests: the final result is the first.</summary>
    public static RetestPolicy None { get; } = new(0);

    /// <summary>Retests allowed after the first measurement.</summary>
    public int MaxRetests { get; }

    /// <summary>Measurements that count: 1 + <see cref="MaxRetests"/>.</summary>
    public int MaxMeasurements => MaxRetests + 1;
}
