using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace FilterQA.Data.Configuration;

internal sealed class AuditEntryConfiguration : IEntityTypeConfiguration<AuditEntry>
{
    public void Configure(EntityTypeBuilder<AuditEntry> builder)
    {
        builder.ToTable("audit_entries");
        builder.Property(a => a.ActorId).HasMaxLength(200);
        builder.Property(a => a.ActorName).HasMaxLength(200);
        builder.Property(a => a.Action).AsText();
        builder.Property(a => a.Subject).HasMaxLength(40);
        builder.Property(a => a.SubjectKey).HasMaxLength(200);
        builder.Property(a => a.Detail).HasMaxLength(4000);
        builder.Property(a => a.Reason).HasMaxLength(2000);
        builder.HasOne<LotRecord>().WithMany().HasForeignKey(a => a.LotId).OnDelete(DeleteBehavior.Restrict);
        builder.HasIndex(a => new { a.LotId, a.At });
        builder.HasIndex(a => a.At);
    }
}
