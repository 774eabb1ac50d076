using TripTestLog.Application.Import;
using TripTestLog.Application.Check;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Storage;

namespace TripTestLog.Ingest.Tests;

/// <summary>
/// Fingerprints are hashes of the values as stored (codes such as "as-found" and "cold"), so renaming an enum member
/// can never change them; databases written with the older scheme are re-hashed on open.
/// </summary>
public sealed class FingerprintTests
{
    [Fact]
    public void TheFingerprintOfAKnownTripRow_IsPinned()
    {
        // Pinned, and checked outside .NET: SHA-256 (Python hashlib) of the table name and the 18 values joined by U+001F,
        // first 32 hex digits. A change here silently breaks duplicate detection in every existing database, so it needs a new scheme
        // and a re-hash (FingerprintScheme), not an edit of this value.
        var trip = new TripMeasurement(AssetTag.Of("ARW-DB1-Q03"), TestedAt.Parse("2026-03-06T11:00"), TestStage.AsFound, Pole.All,
            Amperes.Of(18.19), TripOutcome.HeldFor(Seconds.Of(3600)), StartCondition.Cold, Celsius.Of(24.4), "INJ-ARW-1", "T. Adeyemi", "");

        var row = MeasurementTable.Of(trip, deviceId: 3, line: 12);

        Assert.Equal("3|2026-03-06T11:00:00|as-found|all|18.19|0|3600|cold|24.4|INJ-ARW-1|T. Adeyemi|||||||",
            string.Join('|', row.Values.Select(MeasurementTable.Text)));
        Assert.Equal("bf616f4109f6ddf874ca75171065159a", row.Fingerprint);
    }

    [Fact]
    public void ADatabaseWithOldFingerprints_IsRehashedOnOpen_SoItsRowsStillCountAsDuplicates()
    {
        using var temp = new TempFolder();
        var db = Path.Combine(temp.Path, "old.db");
        File.Copy(Path.Combine(AppContext.BaseDirectory, "schemas", "schema-2.db"), db);
        var copy = temp.Write("trips-again.csv", File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "schemas", "schema-2-source", "trips.csv")) + "\n");

        using var store = RecordStore.Open(db);
        var again = store.Import(RecordFileReader.Read(copy, Records.Today), DateTimeOffset.UtcNow);

        Assert.Equal((ImportStatus.Imported, 0L, 4L), (again.Status, again.Added, again.Duplicates));
    }
}
