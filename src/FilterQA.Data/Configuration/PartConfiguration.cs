using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace FilterQA.Data.Configuration;

internal sealed class PartConfiguration : IEntityTypeConfiguration<PartRecord>
{
    public void Configure(EntityTypeBuilder<PartRecord> builder)
    {
        builder.ToTable("parts");
        builder.Property(p => p.PartNumber).HasMaxLength(40);
        builder.Property(p => p.Description).HasMaxLength(400);
        builder.Property(p => p.DeviceKind).HasMaxLength(EnumText.Length);
        builder.HasIndex(p => p.PartNumber).IsUnique();
        builder.HasMany(p => p.Revisions).WithOne(r => r.Part).HasForeignKey(r => r.PartId).OnDelete(DeleteBehavior.Restrict);
    }
}
