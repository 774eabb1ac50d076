using System.Globalization;
using System.Text;
using Npgsql;
using TripTestLog.Ingest.Tests.Stores;

namespace TripTestLog.Cli.Tests.Opening;

/// <summary>
/// Two labs on one server, each confined to its own site by scripts/server-lab-sites.sql: real roles on the test server,
/// real processes. Neither reads, imports into or corrects the other's records; the owner still sees both.
/// </summary>
public sealed class LabSitesTests : IDisposable
{
    private const string Password = "lab-sites-test-password";
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "ttl-sites-" + Guid.NewGuid().ToString("N")[..12]);
    private readonly string _suffix = Guid.NewGuid().ToString("N")[..10];
    private readonly List<string> _roles = [];
    private readonly TestDatabase? _database;

    public LabSitesTests()
    {
        Directory.CreateDirectory(_folder);
        if (TestDatabase.Server is not null)
        {
            _database = TestDatabase.Create(Provider.Postgres, _folder);
        }
    }

    public void Dispose()
    {
        _database?.Dispose();
        if (_roles.Count > 0)
        {
            using var connection = new NpgsqlConnection(TestDatabase.Server);
            connection.Open();
            foreach (var role in _roles)
            {
                Execute(connection, $"DROP ROLE {role}");
            }
        }

        Directory.Delete(_folder, recursive: true);
    }

    [ServerFact]
    public void TwoLabRoles_EachSeesAndWritesOnlyItsOwnSite()
    {
        var database = _database!;
        var register = Write("register.csv", "asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v\n"
            + "P-01,Hill Farm,Board 1,iec60898,C,16,1,230\nQ-01,Quarry Road,Board 7,iec60898,C,16,1,230\n");
        var hill = Trips("hill.csv", "P-01", 4, 0);
        var quarry = Trips("quarry.csv", "Q-01", 6, 0);
        Assert.Equal(0, CliRun.Run("import", register, hill, quarry, "--db", database.Address).Exit);
        var (north, south) = (Role("north"), Role("south"));
        Confine(database.Schema!, (north, "Hill Farm"), (south, "Quarry Road"));

        // Reads: each lab's check and device list hold its own site alone.
        foreach (var (role, own, other, count) in new[] { (north, "P-01", "Q-01", 4), (south, "Q-01", "P-01", 6) })
        {
            using var check = As(role, database, "check");
            Assert.True(check.Exit(TimeSpan.FromSeconds(90)) == 0, check.Error);
            Assert.Contains($"Checked {count} trip tests", check.Out + check.Error, StringComparison.Ordinal);

            using var devices = As(role, database, "devices");
            Assert.True(devices.Exit(TimeSpan.FromSeconds(90)) == 0, devices.Error);
            Assert.Contains(own, devices.Out, StringComparison.Ordinal);
            Assert.DoesNotContain(other, devices.Out, StringComparison.Ordinal);

            Assert.Equal(count, Count(role, database, "SELECT COUNT(*) FROM trip_tests"));
            Assert.Equal(0, Count(role, database, $"SELECT COUNT(*) FROM devices WHERE asset_tag = '{other}'"));
        }

        // Import into the other's site: tests for its device, and a new device placed at its site; both refused whole.
        using (var tests = As(north, database, "import", Trips("north-into-quarry.csv", "Q-01", 3, 500)))
        {
            Assert.Equal(2, tests.Exit(TimeSpan.FromSeconds(90)));
            Assert.Contains("Q-01", tests.Out + tests.Error, StringComparison.Ordinal);
        }

        var intruder = Write("north-register.csv", "asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v\n"
            + "Q-99,Quarry Road,Board 9,iec60898,C,16,1,230\n");
        using (var device = As(north, database, "import", intruder))
        {
            Assert.Equal(2, device.Exit(TimeSpan.FromSeconds(90)));
            Assert.Contains("the file names a site this role may not write: its rows are confined to its own sites (site_access on the server); "
                + "nothing of the file was stored", CliRun.Unwrapped(device.Error),
                StringComparison.Ordinal);
            Assert.DoesNotContain("   at ", device.Error, StringComparison.Ordinal);
        }

        // Correction: the south lab's file, one value changed, offered by the north lab as its correction.
        var corrected = Write("quarry-fixed.csv", File.ReadAllText(quarry).Replace(",10,,cold", ",11,,cold", StringComparison.Ordinal));
        using (var correction = As(north, database, "import", corrected, "--replace", "quarry.csv"))
        {
            Assert.NotEqual(0, correction.Exit(TimeSpan.FromSeconds(90)));
        }

        // And in SQL, past the tool: an update of every row changes the lab's own alone; a delete of the other's, nothing.
        var hillDevice = database.Count("SELECT id FROM devices WHERE asset_tag = 'P-01'");
        Assert.Equal(6, Count(south, database, "WITH changed AS (UPDATE trip_tests SET time_s = 1 RETURNING 1) SELECT COUNT(*) FROM changed"));
        Assert.Equal(0, Count(south, database, $"WITH gone AS (DELETE FROM trip_tests WHERE device_id = {hillDevice} RETURNING 1) SELECT COUNT(*) FROM gone"));

        // The owner sees both sites as they were: the north lab's rows untouched, nothing of the refused imports stored.
        Assert.Equal(4L, database.Count("SELECT COUNT(*) FROM trip_tests t JOIN devices d ON d.id = t.device_id WHERE d.asset_tag = 'P-01' "
            + "AND t.time_s <> 1"));
        Assert.Equal(6L, database.Count("SELECT COUNT(*) FROM trip_tests t JOIN devices d ON d.id = t.device_id WHERE d.asset_tag = 'Q-01'"));
        Assert.Equal(0L, database.Count("SELECT COUNT(*) FROM devices WHERE asset_tag = 'Q-99'"));
        Assert.Equal(0L, database.Count("SELECT COUNT(*) FROM audit_changes"));
    }

    private string Role(string lab)
    {
        var role = $"lab_{lab}_{_suffix}";
        using var connection = new NpgsqlConnection(TestDatabase.Server);
        connection.Open();
        Execute(connection, $"CREATE ROLE {role} LOGIN PASSWORD '{Password}'");
        _roles.Add(role);
        return role;
    }

    // scripts/server-roles.sql with both labs as importers, then scripts/server-lab-sites.sql and one site each, as the
    // owner runs them with psql -v.
    private static void Confine(string schema, params (string Role, string Site)[] labs)
    {
        using var connection = new NpgsqlConnection(TestDatabase.Server);
        connection.Open();
        foreach (var (role, _) in labs)
        {
            Execute(connection, Script("server-roles.sql", schema).Replace(":\"reader\"", $"\"{role}\"", StringComparison.Ordinal)
                .Replace(":\"importer\"", $"\"{role}\"", StringComparison.Ordinal));
        }

        Execute(connection, Script("server-lab-sites.sql", schema));
        foreach (var (role, site) in labs)
        {
            Execute(connection, $"INSERT INTO \"{schema}\".site_access (role_name, site) VALUES ('{role}', '{site}')");
        }
    }

    private static string Script(string name, string schema) =>
        File.ReadAllText(Repository("scripts", name)).Replace(":\"schema\"", $"\"{schema}\"", StringComparison.Ordinal);

    private static Child As(string role, TestDatabase database, params string[] args) =>
        Child.StartWith(new Dictionary<string, string> { ["PGPASSWORD"] = Password }, null, [.. args, "--db", AddressOf(role, database)]);

    private static string AddressOf(string role, TestDatabase database) =>
        new NpgsqlConnectionStringBuilder(database.Address) { Username = role, Password = null }.ConnectionString;

    private static long Count(string role, TestDatabase database, string sql)
    {
        using var connection = new NpgsqlConnection(new NpgsqlConnectionStringBuilder(database.Address) { Username = role, Password = Password }
            .ConnectionString);
        connection.Open();
        using var command = new NpgsqlCommand(sql, connection);
        return Convert.ToInt64(command.ExecuteScalar(), CultureInfo.InvariantCulture);
    }

    private string Write(string name, string text)
    {
        var path = Path.Combine(_folder, name);
        File.WriteAllText(path, text);
        return path;
    }

    private string Trips(string name, string tag, int rows, int offsetSeconds)
    {
        var sb = new StringBuilder("asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start\n");
        for (var i = 0; i < rows; i++)
        {
            var at = new DateTime(2020, 1, 1).AddSeconds(offsetSeconds + i).ToString("yyyy-MM-ddTHH:mm:ss", CultureInfo.InvariantCulture);

            // 40.9 A is 2.56 In of a 16 A curve-C breaker: 10 to 49 s lies inside IEC 60898-1 Table 7's 1 s to 60 s band.
            sb.Append(tag).Append(',').Append(at).Append(",as-found,all,40.9,").Append((10 + i).ToString(CultureInfo.InvariantCulture)).Append(",,cold\n");
        }

        return Write(name, sb.ToString());
    }

    private static void Execute(NpgsqlConnection connection, string sql)
    {
        using var command = new NpgsqlCommand(sql, connection);
        command.ExecuteNonQuery();
    }

    private static string Repository(params string[] parts)
    {
        for (var folder = new DirectoryInfo(AppContext.BaseDirectory); folder is not null; folder = folder.Parent)
        {
            var candidate = Path.Combine([folder.FullName, .. parts]);
            if (File.Exists(candidate))
            {
                return candidate;
            }
        }

        throw new FileNotFoundException($"{Path.Combine(parts)} was not found above {AppContext.BaseDirectory}");
    }
}
