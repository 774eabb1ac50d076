using Microsoft.Data.Sqlite;

namespace TripTestLog.Cli.Tests;

/// <summary>
/// A folder import walks real links: an entry that cannot be read is refused by name, and the rest is imported. A field
/// past the documented length is refused by file, line and column.
/// </summary>
public sealed class FolderImportTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "ttl-walk-" + Guid.NewGuid().ToString("N")[..12]);

    [Fact]
    public void ADanglingLink_AndLoopsOfLinks_AreRefusedByName_AndTheOtherFilesAreImported()
    {
        var records = Path.Combine(_folder, "records");
        Directory.CreateDirectory(Path.Combine(records, "lab"));
        File.Copy(Path.Combine(Golden.RepositoryRoot(), "sample-records", "device-register.csv"), Path.Combine(records, "device-register.csv"));
        File.WriteAllLines(Path.Combine(records, "lab", "trips.csv"),
        [
            "asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start,ambient_c,instrument,technician,note",
            "ARW-DB1-Q03,2026-03-06T11:00,as-found,all,18.18,,3600,cold,18.9,INJ-ARW-1,T. Adeyemi,",
        ]);
        File.CreateSymbolicLink(Path.Combine(records, "gone.csv"), Path.Combine(_folder, "moved-away.csv"));
        File.CreateSymbolicLink(Path.Combine(records, "loop-a.csv"), Path.Combine(records, "loop-b.csv"));
        File.CreateSymbolicLink(Path.Combine(records, "loop-b.csv"), Path.Combine(records, "loop-a.csv"));
        Directory.CreateSymbolicLink(Path.Combine(records, "lab", "up"), records);
        var db = Path.Combine(_folder, "t.db");

        var (exit, output, error) = CliRun.Run("import", records, "--db", db, "--as-of", "2026-12-01");

        Assert.True(exit == 2, output + error);
        Assert.Contains($"refused: {Path.Combine(records, "gone.csv")}: a link to {Path.Combine(_folder, "moved-away.csv")}, which does not exist; "
            + "skipped, the other files were imported", error, StringComparison.Ordinal);
        Assert.Contains($"refused: {Path.Combine(records, "loop-a.csv")}: a link that leads round in a loop", error, StringComparison.Ordinal);
        Assert.Contains($"refused: {Path.Combine(records, "loop-b.csv")}: a link that leads round in a loop", error, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", error, StringComparison.Ordinal);
        using var connection = new SqliteConnection($"Data Source={db};Mode=ReadOnly;Pooling=False");
        connection.Open();
        using var count = new SqliteCommand("SELECT (SELECT COUNT(*) FROM trip_tests) || '/' || (SELECT COUNT(*) FROM source_files)", connection);

        // The register and the one trip file, each once: the linked folder leading back up is not walked again.
        Assert.Equal("1/2", count.ExecuteScalar());
    }

    [Fact]
    public void ANoteLongerThanTheFieldLimit_IsRefusedByFileLineAndColumn_AndA50MegabyteOne_WithoutBeingHeld()
    {
        Directory.CreateDirectory(_folder);
        var register = Path.Combine(Golden.RepositoryRoot(), "sample-records", "device-register.csv");
        const string Header = "asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start,ambient_c,instrument,technician,note";
        const string Row = "ARW-DB1-Q03,2026-03-06T11:00,as-found,all,18.18,,3600,cold,18.9,INJ-ARW-1,T. Adeyemi,";
        var longer = Path.Combine(_folder, "longer.csv");
        File.WriteAllLines(longer, [Header, Row + "fits", Row.Replace("11:00", "12:00", StringComparison.Ordinal) + new string('n', 4001)]);
        var huge = Path.Combine(_folder, "huge.csv");
        using (var writer = new StreamWriter(huge))
        {
            writer.WriteLine(Header);
            writer.WriteLine(Row + "fits");
            writer.Write(Row.Replace("11:00", "12:00", StringComparison.Ordinal) + "\"");
            var block = new string('n', 1 << 20);
            for (var i = 0; i < 50; i++)
            {
                writer.Write(block);
            }

            writer.WriteLine("\"");
        }

        var db = Path.Combine(_folder, "t.db");
        Assert.Equal(0, CliRun.Run("import", register, "--db", db, "--as-of", "2026-12-01").Exit);

        var (exit, output, error) = CliRun.Run("import", longer, huge, "--db", db, "--as-of", "2026-12-01");

        Assert.True(exit == 2, output + error);
        var text = System.Text.RegularExpressions.Regex.Replace(output + error, @"\s+", " ");
        Assert.Contains("longer.csv:3, column note: the field is 4,001 characters long; the longest a field may be is 4,000", text, StringComparison.Ordinal);
        Assert.Contains("huge.csv:3, column note: the field runs on past 1,048,576 bytes; the longest a field may be is 4,000 characters", text, StringComparison.Ordinal);
        Assert.Contains("reading stopped, so the file is refused", text, StringComparison.Ordinal);
        using var connection = new SqliteConnection($"Data Source={db};Mode=ReadOnly;Pooling=False");
        connection.Open();
        using var count = new SqliteCommand("SELECT COUNT(*) FROM trip_tests", connection);
        Assert.Equal(0L, count.ExecuteScalar());
    }

    public void Dispose()
    {
        SqliteConnection.ClearAllPools();
        Directory.Delete(_folder, recursive: true);
    }
}
