using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace FilterQA.Data.Configuration;

internal sealed class SetupStepConfiguration : IEntityTypeConfiguration<SetupStepRecord>
{
    public void Configure(EntityTypeBuilder<SetupStepRecord> builder)
    {
        builder.ToTable("setup_steps");
        builder.Property(s => s.Name).HasMaxLength(80);
        builder.HasIndex(s => s.Name).IsUnique();
    }
}
