using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace FilterQA.Data.Configuration;

internal sealed class RuleResultConfiguration : IEntityTypeConfiguration<RuleResultRecord>
{
    public void Configure(EntityTypeBuilder<RuleResultRecord> builder)
    {
        builder.ToTable("rule_results");
        builder.Property(r => r.RuleId).HasMaxLength(64);
        builder.Property(r => r.Kind).AsText();
        builder.Property(r => r.Title).HasMaxLength(200);
        builder.Property(r => r.Unit).AsText();
        builder.Property(r => r.Sense).AsText();
        builder.Property(r => r.Outcome).AsText();
        builder.Property(r => r.Message).HasMaxLength(2000);
        builder.HasIndex(r => new { r.MeasurementId, r.Ordinal }).IsUnique();
    }
}
