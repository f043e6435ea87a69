using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace FilterQA.Data.Configuration;

internal sealed class CertificateConfiguration : IEntityTypeConfiguration<CertificateRecord>
{
    public void Configure(EntityTypeBuilder<CertificateRecord> builder)
    {
        builder.ToTable("certificates");
        builder.Property(c => c.CertificateNumber).HasMaxLength(80);
        builder.Property(c => c.DataDigestSha256).HasMaxLength(64);
        builder.Property(c => c.SignerId).HasMaxLength(200);
        builder.Property(c => c.SignerName).HasMaxLength(200);
        builder.Property(c => c.Reason).HasMaxLength(2000);
        builder.HasOne<LotRecord>().WithMany().HasForeignKey(c => c.LotId).OnDelete(DeleteBehavior.Restrict);

        // Concurrent issuers race for the next number; the loser's insert fails here and it tries again.
        builder.HasIndex(c => c.CertificateNumber).IsUnique();
        builder.HasIndex(c => c.Sequence).IsUnique();
        // Nothing is certified twice: a second issue for the same lot fails here and returns the first.
        builder.HasIndex(c => c.LotId).IsUnique();
    }
}
