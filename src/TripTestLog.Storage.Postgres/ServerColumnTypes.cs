using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;
using Microsoft.EntityFrameworkCore.Storage.ValueConversion;
using TripTestLog.Storage.Entities;

namespace TripTestLog.Storage.Postgres;

/// <summary>
/// The same model on the PostgreSQL server, with the server's own column types where SQLite keeps text: `date` for
/// calendar dates, `timestamptz` for the moments the tool records, `jsonb` for settings and `bytea` for record
/// fingerprints. A test time is the site's wall-clock time as written, never an instant, so it is a `timestamp`
/// (without time zone) beside the offset the record gave, if any, and whether it gave a time of day at all.
/// </summary>
internal static class ServerColumnTypes
{
    /// <summary>The column that holds a test's UTC offset in minutes, when its record gave one.</summary>
    public const string OffsetColumn = "tested_offset_min";

    /// <summary>The column that says whether a test's record gave a time of day.</summary>
    public const string HasTimeColumn = "tested_has_time";

    private static readonly ValueConverter<string, byte[]> Hex = new(v => Convert.FromHexString(v), v => Convert.ToHexStringLower(v));

    public static void Apply(ModelBuilder model)
    {
        model.Entity<SourceFileRow>().Property(x => x.ImportedAt).HasConversion<DateTimeOffset>();
        model.Entity<DeviceRow>(e =>
        {
            // Byte order, as SQLite's binary collation: the streaming read merges queries by asset tag.
            e.Property(x => x.AssetTag).UseCollation("C");
            Register(e.Property(x => x.CommissionedOn), e.Property(x => x.SettingsFrom), e.Property(x => x.SettingsJson));
        });
        model.Entity<DeviceRevisionRow>(e =>
        {
            Register(e.Property(x => x.CommissionedOn), e.Property(x => x.SettingsFrom), e.Property(x => x.SettingsJson));
            e.Property(x => x.RecordedAt).HasConversion<DateTimeOffset>();
        });
        model.Entity<TripTestRow>(e => Measurement(e, e.Property(x => x.TestedAt), e.Property(x => x.Fingerprint)));
        model.Entity<ContactTestRow>(e => Measurement(e, e.Property(x => x.TestedAt), e.Property(x => x.Fingerprint)));
        model.Entity<InsulationTestRow>(e => Measurement(e, e.Property(x => x.TestedAt), e.Property(x => x.Fingerprint)));
        model.Entity<AuditChangeRow>().Property(x => x.ChangedAt).HasConversion<DateTimeOffset>();
        model.Entity<InstrumentRow>(e =>
        {
            e.Property(x => x.CalibratedOn).HasConversion<DateOnly>();
            e.Property(x => x.CalibrationDue).HasConversion<DateOnly>();
            e.Property(x => x.Fingerprint).HasConversion(Hex);
        });
    }

    private static void Register(PropertyBuilder<string?> commissioned, PropertyBuilder<string?> from, PropertyBuilder<string> settings)
    {
        commissioned.HasConversion<DateOnly?>();
        from.HasConversion<DateOnly?>();
        settings.HasColumnType("jsonb");
    }

    private static void Measurement<T>(EntityTypeBuilder<T> e, PropertyBuilder<string> testedAt, PropertyBuilder<string> fingerprint)
        where T : class
    {
        testedAt.HasConversion<DateTime>().HasColumnType("timestamp without time zone");
        e.Property<short?>("TestedOffsetMin");
        e.Property<bool>("TestedHasTime");
        fingerprint.HasConversion(Hex);
    }
}
