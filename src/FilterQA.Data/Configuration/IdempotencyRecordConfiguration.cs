using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace FilterQA.Data.Configuration;

internal sealed class IdempotencyRecordConfiguration : IEntityTypeConfiguration<IdempotencyRecord>
{
    public void Configure(EntityTypeBuilder<IdempotencyRecord> builder)
    {
        builder.ToTable("idempotency_records");
        builder.Property(r => r.KeySha256).HasMaxLength(64);
        builder.Property(r => r.RequestSha256).HasMaxLength(64);
        builder.Property(r => r.ContentType).HasMaxLength(100);
        builder.HasIndex(r => r.KeySha256).IsUnique();
    }
}
