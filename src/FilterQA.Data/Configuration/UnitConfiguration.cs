using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace FilterQA.Data.Configuration;

internal sealed class UnitConfiguration : IEntityTypeConfiguration<UnitRecord>
{
    public void Configure(EntityTypeBuilder<UnitRecord> builder)
    {
        builder.ToTable("units");
        builder.Property(u => u.Serial).HasMaxLength(80);
        builder.Property(u => u.FirstVerdict).AsText();
        builder.Property(u => u.LatestVerdict).AsText();
        builder.Property(u => u.CountedVerdict).AsText();
        builder.Property(u => u.Version).IsConcurrencyToken();
        builder.HasOne(u => u.Lot).WithMany().HasForeignKey(u => u.LotId).OnDelete(DeleteBehavior.Restrict);
        // The latest measurement per unit is a pointer kept in the unit row, not a MAX() over attempts.
        builder.HasOne(u => u.LatestMeasurement).WithMany().HasForeignKey(u => u.LatestMeasurementId).OnDelete(DeleteBehavior.Restrict);
        builder.HasOne<MeasurementRecord>().WithMany().HasForeignKey(u => u.CountedMeasurementId).OnDelete(DeleteBehavior.Restrict);
        builder.HasIndex(u => new { u.LotId, u.Serial }).IsUnique();
        builder.HasIndex(u => new { u.LotId, u.SamplePosition }).IsUnique();
    }
}
