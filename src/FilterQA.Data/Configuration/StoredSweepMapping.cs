using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace FilterQA.Data.Configuration;

/// <summary>Maps a <see cref="StoredSweep"/> into the owning row's columns (prefix "Sweep_").</summary>
internal static class StoredSweepMapping
{
    internal static void Map(ComplexPropertyBuilder<StoredSweep> sweep)
    {
        sweep.Property(s => s.FileName).HasMaxLength(260);
        sweep.Property(s => s.Format).AsText();
        sweep.Property(s => s.RawSha256).HasMaxLength(64);
        sweep.Property(s => s.Path).AsText();
    }
}
