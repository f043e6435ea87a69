using FilterQA.Data.Configuration;
using FilterQA.Data.Entities;
using Microsoft.AspNetCore.Identity.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data;

/// <summary>
/// The one database of FilterQA: inspection records and the ASP.NET Core Identity accounts.
/// The same model serves SQLite and PostgreSQL; each provider has its own migrations project.
/// </summary>
public sealed class FilterQaDbContext : IdentityDbContext<FilterQaUser>
{
    public FilterQaDbContext(DbContextOptions<FilterQaDbContext> options)
        : base(options)
    {
    }

    public DbSet<PartRecord> Parts => Set<PartRecord>();

    public DbSet<TemplateRevisionRecord> TemplateRevisions => Set<TemplateRevisionRecord>();

    public DbSet<StationRecord> Stations => Set<StationRecord>();

    public DbSet<ThruReferenceRecord> ThruReferences => Set<ThruReferenceRecord>();

    public DbSet<LotRecord> Lots => Set<LotRecord>();

    public DbSet<UnitRecord> Units => Set<UnitRecord>();

    public DbSet<MeasurementRecord> Measurements => Set<MeasurementRecord>();

    public DbSet<RuleResultRecord> RuleResults => Set<RuleResultRecord>();

    public DbSet<AuditEntry> AuditEntries => Set<AuditEntry>();

    public DbSet<StationApiKeyRecord> StationApiKeys => Set<StationApiKeyRecord>();

    public DbSet<IdempotencyRecord> IdempotencyRecords => Set<IdempotencyRecord>();

    public DbSet<SetupStepRecord> SetupSteps => Set<SetupStepRecord>();

    public DbSet<CertificateRecord> Certificates => Set<CertificateRecord>();
    public DbSet<ReferenceUnitRecord> ReferenceUnits => Set<ReferenceUnitRecord>();

    public override int SaveChanges(bool acceptAllChangesOnSuccess)
    {
        StorageRules.Check(ChangeTracker);
        return base.SaveChanges(acceptAllChangesOnSuccess);
    }

    public override Task<int> SaveChangesAsync(bool acceptAllChangesOnSuccess, CancellationToken cancellationToken = default)
    {
        StorageRules.Check(ChangeTracker);
        return base.SaveChangesAsync(acceptAllChangesOnSuccess, cancellationToken);
    }

    protected override void OnModelCreating(ModelBuilder builder)
    {
        base.OnModelCreating(builder);
        builder.ApplyConfigurationsFromAssembly(typeof(FilterQaDbContext).Assembly);
        // A badge names one person; accounts without a badge leave it empty.
        builder.Entity<FilterQaUser>().Property(u => u.BadgeNumber).HasMaxLength(40);
        builder.Entity<FilterQaUser>().Property(u => u.DisplayName).HasMaxLength(120);
        builder.Entity<FilterQaUser>().HasIndex(u => u.BadgeNumber).IsUnique().HasFilter("\"BadgeNumber\" <> ''");
    }

    protected override void ConfigureConventions(ModelConfigurationBuilder configurationBuilder)
    {
        ArgumentNullException.ThrowIfNull(configurationBuilder);
        // SQLite has no time type: EF stores DateTimeOffset as text that it cannot compare or sort
        // in SQL. UTC ticks compare, sort and round-trip exactly. PostgreSQL keeps timestamptz,
        // which accepts only offset zero, so every value is normalised to UTC on the way in.
        if (Database.IsSqlite())
        {
            configurationBuilder.Properties<DateTimeOffset>().HaveConversion<UtcTicksConverter>();
        }
        else
        {
            configurationBuilder.Properties<DateTimeOffset>().HaveConversion<UtcNormalisingConverter>();
        }
    }
}
