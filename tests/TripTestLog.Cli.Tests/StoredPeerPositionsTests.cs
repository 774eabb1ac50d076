using System.Globalization;
using System.Text.Json;
using Microsoft.Data.Sqlite;

namespace TripTestLog.Cli.Tests;

/// <summary>
/// Each device's place among its peers, kept in the SQLite file by import, so one device's findings read its groups'
/// figures instead of judging every peer's tests. The stored figures are read while current, never once their records
/// or the judging basis changed, and import brings up to date only the devices whose records changed. The sample's peer
/// outlier is CWD-DB1-Q04 (OneDeviceFindingsTests holds every device's answer equal to the whole fleet's run).
/// </summary>
public sealed class StoredPeerPositionsTests : IDisposable
{
    private const string Outlier = "CWD-DB1-Q04";
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "ttl-peers-" + Guid.NewGuid().ToString("N")[..12]);

    public StoredPeerPositionsTests()
    {
        var (exit, _, error) = CliRun.Run("demo", "--records", Path.Combine(Golden.RepositoryRoot(), "sample-records"), "--out", _folder);
        Assert.True(exit == 0, error);
    }

    private string Db => Path.Combine(_folder, "triptestlog.db");

    public void Dispose()
    {
        SqliteConnection.ClearAllPools();
        Directory.Delete(_folder, recursive: true);
    }

    [Fact]
    public void OneDevicesFindings_ReadItsPeersStoredPositions_WhileTheyAreCurrent_AndWorkThemOutOnceTheBasisChanges()
    {
        Assert.Equal(Count("SELECT COUNT(*) FROM devices"), Count("SELECT COUNT(*) FROM peer_stamps"));
        Assert.Contains("peer-outlier", Kinds(Outlier));

        // Every peer placed where the outlier is: if the stored figures are what is read, it is no outlier any more.
        PlaceEveryPeerWhereTheOutlierIs();
        Assert.DoesNotContain("peer-outlier", Kinds(Outlier));

        // A policy that judges otherwise (another point window) is another basis: the stored figures are not used.
        File.AppendAllText(Path.Combine(_folder, "lab-policy.conf"), "\npoint_window_pct = 4\n");
        Assert.Equal(WholeFleet(Outlier), Findings(Outlier));
        Assert.Contains("peer-outlier", Kinds(Outlier));

        // The next import works every device out again under that basis: the stored figures are the judged ones.
        Assert.Equal(0, CliRun.Run("import", OneTrip("extra.csv", "BPS-DB1-Q03", "2026-11-20T09:00:00"), "--db", Db).Exit);
        Assert.Equal(0L, Count("SELECT COUNT(*) FROM peer_stamps WHERE basis NOT LIKE '%|4|DecisionPolicy%'"));
        Assert.Equal(WholeFleet(Outlier), Findings(Outlier));
    }

    [Fact]
    public void TheWholeFleetsFindings_ReadTheKeptPlaces_AndMatchTheFindingsWorkedOutFromEveryTest()
    {
        var kept = Everything();

        // Without the kept places every device's place is worked out from its tests: the same findings.
        Sql("DELETE FROM peer_positions; DELETE FROM peer_stamps");
        Assert.Equal(kept, Everything());

        // Kept again by the next import, and read: every peer placed where the outlier is, it is no outlier any more.
        Assert.Equal(0, CliRun.Run("import", OneTrip("extra.csv", "BPS-DB1-Q03", "2026-11-20T09:00:00"), "--db", Db).Exit);
        Assert.Equal(Count("SELECT COUNT(*) FROM devices"), Count("SELECT COUNT(*) FROM peer_stamps"));
        Assert.Contains("peer-outlier", KindsInFleet(Outlier));
        PlaceEveryPeerWhereTheOutlierIs();
        Assert.DoesNotContain("peer-outlier", KindsInFleet(Outlier));

        // A policy that judges otherwise is another basis: the altered places are not used, and the outlier is back.
        File.AppendAllText(Path.Combine(_folder, "lab-policy.conf"), "\npoint_window_pct = 4\n");
        Assert.Contains("peer-outlier", KindsInFleet(Outlier));
    }

    [Fact]
    public void AnImport_WorksOutAgainOnlyTheDevicesWhoseRecordsChanged_AndACorrectionAllOfThem()
    {
        var changed = "BPS-DB1-Q03";
        var untouched = "ARW-DB1-Q01";
        var (before, other, basis) = (Stamp(changed), Stamp(untouched), Basis(untouched));

        var file = OneTrip("late.csv", changed, "2026-11-21T10:00:00");
        Assert.Equal(0, CliRun.Run("import", file, "--db", Db).Exit);
        var added = Stamp(changed);
        Assert.NotEqual(before, added);
        Assert.Equal((other, basis), (Stamp(untouched), Basis(untouched)));

        // The same file corrected (another trip time): values changed in place, so every device is worked out again
        // under the new reference stamp, and the answers are the judged ones.
        var corrected = Path.Combine(_folder, "late-corrected.csv");
        File.WriteAllText(corrected, File.ReadAllText(file).Replace(",61.0,", ",64.0,", StringComparison.Ordinal));
        var (exit, _, error) = CliRun.Run("import", corrected, "--replace", file, "--db", Db);
        Assert.True(exit == 0, error);
        Assert.NotEqual(basis, Basis(untouched));
        Assert.Equal(1L, Count("SELECT COUNT(DISTINCT basis) FROM peer_stamps"));
        Assert.Equal(Count("SELECT COUNT(*) FROM devices"), Count("SELECT COUNT(*) FROM peer_stamps"));
        Assert.Equal(WholeFleet(changed), Findings(changed));
    }

    // Every kept place in the outlier's groups set to the outlier's own: read, they make it no outlier.
    private void PlaceEveryPeerWhereTheOutlierIs() =>
        Sql($"UPDATE peer_positions SET position = (SELECT o.position FROM peer_positions o JOIN devices d ON d.id = o.device_id "
            + $"WHERE d.asset_tag = '{Outlier}' AND o.group_key = peer_positions.group_key) WHERE group_key IN (SELECT o.group_key FROM peer_positions o "
            + $"JOIN devices d ON d.id = o.device_id WHERE d.asset_tag = '{Outlier}')");

    // One trip test for the device at 2.55 In (the sample's C16 miniature breakers' cold point), 61 s.
    private string OneTrip(string name, string tag, string at)
    {
        var path = Path.Combine(_folder, name);
        File.WriteAllText(path, "asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start\n"
            + $"{tag},{at},as-found,all,40.8,61.0,,cold\n");
        return path;
    }

    private List<string> Findings(string tag) =>
        [.. JsonDocument.Parse(CliRun.Run("findings", "--json", "--include-closed", "--as-of", "2026-12-01", "--asset", tag, "--db", Db).Out)
            .RootElement.EnumerateArray().Select(f => f.GetRawText())];

    private List<string> WholeFleet(string tag) =>
        [.. JsonDocument.Parse(CliRun.Run("findings", "--json", "--include-closed", "--as-of", "2026-12-01", "--db", Db).Out)
            .RootElement.EnumerateArray().Where(f => f.GetProperty("asset_tag").GetString() == tag).Select(f => f.GetRawText())];

    private string Everything() =>
        CliRun.Run("findings", "--json", "--include-closed", "--as-of", "2026-12-01", "--db", Db).Out;

    private List<string> KindsInFleet(string tag) =>
        [.. WholeFleet(tag).Select(f => JsonDocument.Parse(f).RootElement.GetProperty("kind").GetString()!)];

    private List<string> Kinds(string tag) =>
        [.. Findings(tag).Select(f => JsonDocument.Parse(f).RootElement.GetProperty("kind").GetString()!)];

    private string Stamp(string tag) => Stored("stamp", tag);

    private string Basis(string tag) => Stored("basis", tag);

    private string Stored(string column, string tag)
    {
        using var connection = Open();
        using var command = connection.CreateCommand();
        command.CommandText = $"SELECT s.{column} FROM peer_stamps s JOIN devices d ON d.id = s.device_id WHERE d.asset_tag = $tag";
        command.Parameters.AddWithValue("$tag", tag);
        return (string)command.ExecuteScalar()!;
    }

    private long Count(string sql)
    {
        using var connection = Open();
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        return Convert.ToInt64(command.ExecuteScalar(), CultureInfo.InvariantCulture);
    }

    private void Sql(string sql)
    {
        using var connection = Open();
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        command.ExecuteNonQuery();
    }

    private SqliteConnection Open()
    {
        var connection = new SqliteConnection($"Data Source={Db};Pooling=False");
        connection.Open();
        return connection;
    }
}
