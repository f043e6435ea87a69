using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace FilterQA.Data.Configuration;

internal sealed class MeasurementConfiguration : IEntityTypeConfiguration<MeasurementRecord>
{
    public void Configure(EntityTypeBuilder<MeasurementRecord> builder)
    {
        builder.ToTable("measurements");
        builder.Property(m => m.TemplateHash).HasMaxLength(71);
        builder.Property(m => m.OperatorId).HasMaxLength(200);
        builder.Property(m => m.OperatorName).HasMaxLength(200);
        builder.Property(m => m.Verdict).AsText();
        builder.Property(m => m.RetestReason).HasMaxLength(2000);
        builder.Property(m => m.IdempotencyKey).HasMaxLength(100);
        builder.ComplexProperty(m => m.Sweep, StoredSweepMapping.Map);
        builder.HasOne(m => m.Unit).WithMany().HasForeignKey(m => m.UnitId).OnDelete(DeleteBehavior.Restrict);
        builder.HasOne<LotRecord>().WithMany().HasForeignKey(m => m.LotId).OnDelete(DeleteBehavior.Restrict);
        builder.HasOne<TemplateRevisionRecord>().WithMany().HasForeignKey(m => m.TemplateRevisionId).OnDelete(DeleteBehavior.Restrict);
        builder.HasOne(m => m.Station).WithMany().HasForeignKey(m => m.StationId).OnDelete(DeleteBehavior.Restrict);
        builder.HasOne(m => m.ThruReference).WithMany().HasForeignKey(m => m.ThruReferenceId).OnDelete(DeleteBehavior.Restrict);
        builder.HasOne<MeasurementRecord>().WithOne().HasForeignKey<MeasurementRecord>(m => m.SupersedesMeasurementId).OnDelete(DeleteBehavior.Restrict);
        builder.HasMany(m => m.Rules).WithOne().HasForeignKey(r => r.MeasurementId).OnDelete(DeleteBehavior.Restrict);

        // Two writers cannot both store attempt n of a unit; a retest supersedes exactly one attempt.
        builder.HasIndex(m => new { m.UnitId, m.Attempt }).IsUnique();
        builder.HasIndex(m => m.SupersedesMeasurementId).IsUnique();
        builder.HasIndex(m => m.IdempotencyKey).IsUnique();
        builder.HasIndex(m => new { m.LotId, m.UnitId });
        builder.HasIndex(m => new { m.StationId, m.MeasuredAt });
    }
}
