namespace FilterQA.Core.Sampling;

/// <summary>One cell of a single-sampling table: a plan (Ac/Re), an arrow, or blank.</summary>
/// <param name="Kind">What the cell holds.</param>
/// <param name="AcceptanceNumber">Ac: the lot is accepted with at most this many defectives; 0 unless <paramref name="Kind"/> is <see cref="SamplingCellKind.Plan"/>.</param>
/// <param name="RejectionNumber">Re: the lot is rejected with at least this many defectives; 0 unless <paramref name="Kind"/> is <see cref="SamplingCellKind.Plan"/>.</param>
public readonly record struct SamplingCell(SamplingCellKind Kind, int AcceptanceNumber, int RejectionNumber)
{
    /// <summary>A ↓ cell.</summary>
    public static SamplingCell Down => new(SamplingCellKind.ArrowDown, 0, 0);

    /// <summary>A ↑ cell.</summary>
    public static SamplingCell Up => new(SamplingCellKind.ArrowUp, 0, 0);

    /// <summary>A blank cell.</summary>
    public static SamplingCell Blank => new(SamplingCellKind.Blank, 0, 0);

    /// <summary>A plan cell Ac/Re.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Ac negative, or Re not above Ac.</exception>
    public static SamplingCell Of(int acceptanceNumber, int rejectionNumber)
    {
        if (acceptanceNumber < 0 || rejectionNumber <= acceptanceNumber)
        {
            throw new ArgumentOutOfRangeException(nameof(rejectionNumber), rejectionNumber,
                $"a plan needs Ac >= 0 and Re > Ac; got Ac = {acceptanceNumber}");
        }
        return new(SamplingCellKind.Plan, acceptanceNumber, rejectionNumber);
    }

    /// <summary>The cell as the tables print it: "Ac/Re", "↓", "↑" or "" for blank.</summary>
    public override string ToString() => Kind switch
    {
        SamplingCellKind.Plan => FormattableString.Invariant($"{AcceptanceNumber}/{RejectionNumber}"),
        SamplingCellKind.ArrowDown => "↓",
        SamplingCellKind.ArrowUp => "↑",
        _ => "",
    };
}
