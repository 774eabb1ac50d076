using System.Text;
using Microsoft.EntityFrameworkCore;
using TripTestLog.Storage.Entities;

namespace TripTestLog.Storage;

/// <summary>
/// The EF Core model of the store, the same for every database. Tables and columns are snake_case so plain SQL reads
/// naturally; what one database adds (its column types, its defaults) is its adapter's model customiser.
/// </summary>
internal sealed class TripTestLogContext(DbContextOptions<TripTestLogContext> options) : DbContext(options)
{
    public DbSet<SourceFileRow> SourceFiles => Set<SourceFileRow>();

    public DbSet<DeviceRow> Devices => Set<DeviceRow>();

    public DbSet<DeviceRevisionRow> DeviceRevisions => Set<DeviceRevisionRow>();

    public DbSet<TripTestRow> TripTests => Set<TripTestRow>();

    public DbSet<ContactTestRow> ContactTests => Set<ContactTestRow>();

    public DbSet<InsulationTestRow> InsulationTests => Set<InsulationTestRow>();

    public DbSet<CurveTableRowEntity> CurveTableRows => Set<CurveTableRowEntity>();

    public DbSet<AmbientTableRowEntity> AmbientTableRows => Set<AmbientTableRowEntity>();

    public DbSet<AuditChangeRow> AuditChanges => Set<AuditChangeRow>();

    public DbSet<InstrumentRow> Instruments => Set<InstrumentRow>();

    public DbSet<PeerStampRow> PeerStamps => Set<PeerStampRow>();

    public DbSet<PeerPositionRow> PeerPositions => Set<PeerPositionRow>();

    protected override void OnModelCreating(ModelBuilder modelBuilder)
    {
        modelBuilder.Entity<SourceFileRow>(e =>
        {
            e.ToTable("source_files");
            e.HasIndex(x => x.Sha256).IsUnique();
        });
        modelBuilder.Entity<DeviceRow>(e =>
        {
            e.ToTable("devices");
            e.HasIndex(x => x.AssetTag).IsUnique();
            e.Property(x => x.Criticality).HasDefaultValue(2);
            e.HasOne<SourceFileRow>().WithMany().HasForeignKey(x => x.SourceFileId).OnDelete(DeleteBehavior.Restrict);
        });
        modelBuilder.Entity<DeviceRevisionRow>(e =>
        {
            e.ToTable("device_revisions");
            e.Property(x => x.Criticality).HasDefaultValue(2);
            e.HasIndex(x => x.DeviceId);
            e.HasOne<DeviceRow>().WithMany().HasForeignKey(x => x.DeviceId).OnDelete(DeleteBehavior.Restrict);
            e.HasOne<SourceFileRow>().WithMany().HasForeignKey(x => x.SourceFileId).OnDelete(DeleteBehavior.Restrict);
        });
        modelBuilder.Entity<TripTestRow>(e =>
        {
            e.ToTable("trip_tests");
            e.HasIndex(x => x.Fingerprint).IsUnique();

            // The check reader streams device by device: it finds each device's tests here and sorts those few by time.
            // One integer column keeps an import's random inserts cheap (a 4-column index cost 3 s per million rows).
            e.HasIndex(x => x.DeviceId).HasDatabaseName("IX_trip_tests_device");
            e.HasOne<DeviceRow>().WithMany().HasForeignKey(x => x.DeviceId).OnDelete(DeleteBehavior.Restrict);
            // Where each record came from, by line: serves the foreign key and the lookup of a corrected file's lines.
            e.HasIndex(x => new { x.SourceFileId, x.SourceLine }).HasDatabaseName("IX_trip_tests_source");
            e.HasOne<SourceFileRow>().WithMany().HasForeignKey(x => x.SourceFileId).OnDelete(DeleteBehavior.Restrict);
        });
        modelBuilder.Entity<ContactTestRow>(e =>
        {
            e.ToTable("contact_tests");
            e.HasIndex(x => x.Fingerprint).IsUnique();
            e.HasIndex(x => new { x.DeviceId, x.TestedAt });
            e.HasOne<DeviceRow>().WithMany().HasForeignKey(x => x.DeviceId).OnDelete(DeleteBehavior.Restrict);
            // Where each record came from, by line: serves the foreign key and the lookup of a corrected file's lines.
            e.HasIndex(x => new { x.SourceFileId, x.SourceLine }).HasDatabaseName("IX_contact_tests_source");
            e.HasOne<SourceFileRow>().WithMany().HasForeignKey(x => x.SourceFileId).OnDelete(DeleteBehavior.Restrict);
        });
        modelBuilder.Entity<InsulationTestRow>(e =>
        {
            e.ToTable("insulation_tests");
            e.Property(x => x.Instrument).HasDefaultValue("");
            e.HasIndex(x => x.Fingerprint).IsUnique();
            e.HasIndex(x => new { x.DeviceId, x.TestedAt });
            e.HasOne<DeviceRow>().WithMany().HasForeignKey(x => x.DeviceId).OnDelete(DeleteBehavior.Restrict);
            // Where each record came from, by line: serves the foreign key and the lookup of a corrected file's lines.
            e.HasIndex(x => new { x.SourceFileId, x.SourceLine }).HasDatabaseName("IX_insulation_tests_source");
            e.HasOne<SourceFileRow>().WithMany().HasForeignKey(x => x.SourceFileId).OnDelete(DeleteBehavior.Restrict);
        });

        modelBuilder.Entity<CurveTableRowEntity>(e =>
        {
            e.ToTable("curve_table_rows");
            e.HasIndex(x => x.TableName);
            e.HasOne<SourceFileRow>().WithMany().HasForeignKey(x => x.SourceFileId).OnDelete(DeleteBehavior.Restrict);
        });
        modelBuilder.Entity<AmbientTableRowEntity>(e =>
        {
            e.ToTable("ambient_table_rows");
            e.HasIndex(x => x.TableName);
            e.HasOne<SourceFileRow>().WithMany().HasForeignKey(x => x.SourceFileId).OnDelete(DeleteBehavior.Restrict);
        });

        modelBuilder.Entity<AuditChangeRow>(e =>
        {
            e.ToTable("audit_changes");
            e.HasIndex(x => new { x.TableName, x.RecordId });
        });
        modelBuilder.Entity<InstrumentRow>(e =>
        {
            e.ToTable("instruments");
            e.HasIndex(x => x.Instrument);
            e.HasIndex(x => x.Fingerprint).IsUnique();
            e.HasOne<SourceFileRow>().WithMany().HasForeignKey(x => x.SourceFileId).OnDelete(DeleteBehavior.Restrict);
        });

        // Each device's place among its peers, kept by import so one device's findings read its groups, not the fleet.
        modelBuilder.Entity<PeerStampRow>(e =>
        {
            e.ToTable("peer_stamps");
            e.HasKey(x => x.DeviceId);
            e.HasOne<DeviceRow>().WithMany().HasForeignKey(x => x.DeviceId).OnDelete(DeleteBehavior.Cascade);
        });
        modelBuilder.Entity<PeerPositionRow>(e =>
        {
            e.ToTable("peer_positions");
            e.HasIndex(x => x.DeviceId);
            e.HasOne<DeviceRow>().WithMany().HasForeignKey(x => x.DeviceId).OnDelete(DeleteBehavior.Cascade);
        });

        NameColumns(modelBuilder);
    }

    /// <summary>
    /// Names every column after its property in snake_case. A database's own additions (its model customiser) may add
    /// properties, so it names them again once it has.
    /// </summary>
    internal static void NameColumns(ModelBuilder modelBuilder)
    {
        foreach (var entity in modelBuilder.Model.GetEntityTypes())
        {
            foreach (var property in entity.GetProperties())
            {
                property.SetColumnName(SnakeCase(property.Name));
            }
        }
    }

    internal static string SnakeCase(string name)
    {
        var sb = new StringBuilder(name.Length + 8);
        for (var i = 0; i < name.Length; i++)
        {
            var c = name[i];
            if (char.IsUpper(c) && i > 0)
            {
                sb.Append('_');
            }

            sb.Append(char.ToLowerInvariant(c));
        }

        return sb.ToString();
    }
}
