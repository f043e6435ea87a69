using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace FilterQA.Data.Configuration;

internal sealed class TemplateRevisionConfiguration : IEntityTypeConfiguration<TemplateRevisionRecord>
{
    public void Configure(EntityTypeBuilder<TemplateRevisionRecord> builder)
    {
        builder.ToTable("template_revisions");
        builder.Property(r => r.Status).AsText();
        builder.Property(r => r.DecisionRule).AsText();
        builder.Property(r => r.ContentHash).HasMaxLength(71);
        builder.Property(r => r.Author).HasMaxLength(200);
        builder.Property(r => r.RegisteredBy).HasMaxLength(200);
        builder.Property(r => r.ReleasedBy).HasMaxLength(200);
        builder.Property(r => r.ReleaseReason).HasMaxLength(2000);
        builder.Property(r => r.WithdrawnBy).HasMaxLength(200);
        builder.HasIndex(r => new { r.PartId, r.Revision }).IsUnique();
        builder.HasIndex(r => r.ContentHash);
    }
}
