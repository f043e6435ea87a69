using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace FilterQA.Data.Configuration;

internal sealed class ThruReferenceConfiguration : IEntityTypeConfiguration<ThruReferenceRecord>
{
    public void Configure(EntityTypeBuilder<ThruReferenceRecord> builder)
    {
        builder.ToTable("thru_references");
        builder.Property(t => t.OperatorId).HasMaxLength(200);
        builder.Property(t => t.OperatorName).HasMaxLength(200);
        builder.ComplexProperty(t => t.Sweep, StoredSweepMapping.Map);
        builder.HasOne(t => t.Station).WithMany().HasForeignKey(t => t.StationId).OnDelete(DeleteBehavior.Restrict);
        // The screens ask for a station's latest thru.
        builder.HasIndex(t => new { t.StationId, t.MeasuredAt });
    }
}
