using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace FilterQA.Data.Configuration;

internal sealed class ReferenceUnitConfiguration : IEntityTypeConfiguration<ReferenceUnitRecord>
{
    public void Configure(EntityTypeBuilder<ReferenceUnitRecord> builder)
    {
        builder.ToTable("reference_units");
        builder.Property(r => r.Note).HasMaxLength(2000);
        builder.Property(r => r.MarkedById).HasMaxLength(200);
        builder.Property(r => r.MarkedBy).HasMaxLength(200);
        builder.Property(r => r.RemovedBy).HasMaxLength(200);
        builder.Property(r => r.RemovalNote).HasMaxLength(2000);
        builder.HasOne(r => r.Part).WithMany().HasForeignKey(r => r.PartId).OnDelete(DeleteBehavior.Restrict);
        builder.HasOne(r => r.Measurement).WithMany().HasForeignKey(r => r.MeasurementId).OnDelete(DeleteBehavior.Restrict);
        // A measurement is a current reference unit at most once; removed rows stay as history.
        builder.HasIndex(r => r.MeasurementId).IsUnique().HasFilter("\"RemovedAt\" IS NULL");
        builder.HasIndex(r => r.PartId);
    }
}
