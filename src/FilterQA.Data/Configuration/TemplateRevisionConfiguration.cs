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
        builder.Property(r => r.DraftSavedBy).HasMaxLength(200);
        // The token is compared in the UPDATE's WHERE clause, so two saves from the same version cannot both win.
        builder.Property(r => r.DraftVersion).HasDefaultValue(1).IsConcurrencyToken();
        builder.HasIndex(r => new { r.PartId, r.Revision }).IsUnique();
        builder.HasIndex(r => r.ContentHash);
    }
}
