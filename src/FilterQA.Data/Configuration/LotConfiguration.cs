using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace FilterQA.Data.Configuration;

internal sealed class LotConfiguration : IEntityTypeConfiguration<LotRecord>
{
    public void Configure(EntityTypeBuilder<LotRecord> builder)
    {
        builder.ToTable("lots");
        builder.Property(l => l.LotNumber).HasMaxLength(64);
        builder.Property(l => l.Supplier).HasMaxLength(120);
        builder.Property(l => l.SupplierLot).HasMaxLength(120);
        builder.Property(l => l.DateCode).HasMaxLength(40);
        builder.Property(l => l.PurchaseOrder).HasMaxLength(80);
        builder.Property(l => l.Customer).HasMaxLength(120);
        builder.Property(l => l.Status).AsText();
        builder.Property(l => l.SampleDecision).AsText();
        builder.Property(l => l.CreatedBy).HasMaxLength(200);
        builder.Property(l => l.DispositionBy).HasMaxLength(200);
        builder.Property(l => l.DispositionReason).HasMaxLength(2000);
        builder.Property(l => l.HoldReason).HasMaxLength(2000);
        builder.Property(l => l.Version).IsConcurrencyToken();
        builder.ComplexProperty(l => l.Plan, plan =>
        {
            plan.Property(p => p.Kind).AsText();
            plan.Property(p => p.StandardName).HasMaxLength(120);
            plan.Property(p => p.Level).AsText();
            plan.Property(p => p.Severity).AsText();
            plan.Property(p => p.TableLetter).AsText();
            plan.Property(p => p.LetterUsed).AsText();
            plan.Property(p => p.SeverityReason).HasMaxLength(1000);
        });
        builder.ComplexProperty(l => l.Counters);
        builder.HasOne(l => l.Part).WithMany().HasForeignKey(l => l.PartId).OnDelete(DeleteBehavior.Restrict);
        builder.HasOne(l => l.TemplateRevision).WithMany().HasForeignKey(l => l.TemplateRevisionId).OnDelete(DeleteBehavior.Restrict);

        builder.HasIndex(l => l.LotNumber).IsUnique();
        builder.HasIndex(l => new { l.PartId, l.CreatedAt });
        builder.HasIndex(l => new { l.Supplier, l.CreatedAt });
        builder.HasIndex(l => new { l.Status, l.CreatedAt });
        builder.HasIndex(l => l.CreatedAt);
        // The switching history: decided lots of one part from one supplier, in order.
        builder.HasIndex(l => new { l.PartId, l.Supplier, l.DispositionAt });
    }
}
