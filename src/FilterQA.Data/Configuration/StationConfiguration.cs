using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace FilterQA.Data.Configuration;

internal sealed class StationConfiguration : IEntityTypeConfiguration<StationRecord>
{
    public void Configure(EntityTypeBuilder<StationRecord> builder)
    {
        builder.ToTable("stations");
        builder.Property(s => s.Name).HasMaxLength(80);
        builder.Property(s => s.Description).HasMaxLength(400);
        builder.HasIndex(s => s.Name).IsUnique();
    }
}
