using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace FilterQA.Data.Configuration;

internal sealed class StationApiKeyConfiguration : IEntityTypeConfiguration<StationApiKeyRecord>
{
    public void Configure(EntityTypeBuilder<StationApiKeyRecord> builder)
    {
        builder.ToTable("station_api_keys");
        builder.Property(k => k.Label).HasMaxLength(200);
        builder.Property(k => k.KeySha256).HasMaxLength(64);
        builder.Property(k => k.KeyPrefix).HasMaxLength(16);
        builder.Property(k => k.CreatedBy).HasMaxLength(120);
        builder.Property(k => k.RevokedBy).HasMaxLength(120);
        builder.HasIndex(k => k.KeySha256).IsUnique();
        builder.HasOne(k => k.Station).WithMany().HasForeignKey(k => k.StationId).OnDelete(DeleteBehavior.Restrict);
    }
}
