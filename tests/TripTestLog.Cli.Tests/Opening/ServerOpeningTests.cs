using System.Globalization;
using System.Text;
using Npgsql;
using TripTestLog.Ingest.Tests.Stores;

namespace TripTestLog.Cli.Tests.Opening;

/// <summary>A test that needs the test server (scripts/test-server.sh); it is skipped, and says so, without one.</summary>
public sealed class ServerFactAttribute : FactAttribute
{
    public ServerFactAttribute()
    {
        if (TestDatabase.Server is null)
        {
            Skip = $"needs the test server ({TestDatabase.ServerVariable}); scripts/test-server.sh start";
        }
    }
}

/// <summary>
/// Opening a server database, with real roles and real processes: a reader needs SELECT alone; an importer imports but
/// may not change the schema, and is told so in one sentence; a schema from a newer version is refused; a wait on the
/// server-wide import lock is said on stderr and bounded by the lab policy; a connection the server ends mid-import is
/// named as such.
/// </summary>
public sealed class ServerOpeningTests : IDisposable
{
    private const string Password = "role-test-password";
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "ttl-sopen-" + Guid.NewGuid().ToString("N")[..12]);
    private readonly string _suffix = Guid.NewGuid().ToString("N")[..10];
    private readonly List<string> _roles = [];
    private readonly List<TestDatabase> _databases = [];

    public ServerOpeningTests() => Directory.CreateDirectory(_folder);

    public void Dispose()
    {
        foreach (var database in _databases)
        {
            database.Dispose();
        }

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
    public void TheThreeRoles_ReaderReadsWithSelectAlone_ImporterImports_NeitherMayChangeTheSchema()
    {
        var database = Schema();
        Assert.Equal(0, CliRun.Run("import", Register(), Trips("owner.csv", 5, 0), "--db", database.Address).Exit);
        var (reader, importer) = (Role("reader"), Role("importer"));
        Grant(database.Schema!, reader, importer);

        using (var check = As(reader, database, "check"))
        {
            Assert.True(check.Exit(TimeSpan.FromSeconds(90)) == 0, check.Error);
            Assert.Contains("Checked 5 trip tests", check.Out + check.Error, StringComparison.Ordinal);
        }

        using (var refused = As(reader, database, "import", Trips("reader.csv", 5, 100)))
        {
            Assert.Equal(2, refused.Exit(TimeSpan.FromSeconds(90)));
            Assert.Contains("permission denied for table", CliRun.Unwrapped(refused.Error), StringComparison.Ordinal);
            Assert.DoesNotContain("   at ", CliRun.Unwrapped(refused.Error), StringComparison.Ordinal);
        }

        using (var imported = As(importer, database, "import", Trips("importer.csv", 5, 200)))
        {
            Assert.True(imported.Exit(TimeSpan.FromSeconds(90)) == 0, imported.Error);
        }

        Assert.Equal(10L, database.Count("SELECT COUNT(*) FROM trip_tests"));

        // On an empty schema (as after a new release, behind): the reader is told to have the owner migrate; the
        // importer is refused in one sentence, and nothing is created.
        var empty = Schema();
        Grant(empty.Schema!, reader, importer);
        using (var read = As(reader, empty, "check"))
        {
            Assert.Equal(2, read.Exit(TimeSpan.FromSeconds(90)));
            Assert.Contains("holds no TripTestLog schema yet; import records first, or have the owner role run `triptestlog migrate", CliRun.Unwrapped(read.Error),
                StringComparison.Ordinal);
        }

        using (var migrate = As(importer, empty, "migrate"))
        {
            Assert.Equal(2, migrate.Exit(TimeSpan.FromSeconds(90)));
            Assert.Contains($"error: the role {importer} may not create or change the schema of ", CliRun.Unwrapped(migrate.Error), StringComparison.Ordinal);
            Assert.Contains("the owner role runs `triptestlog migrate --db ", CliRun.Unwrapped(migrate.Error), StringComparison.Ordinal);
        }

        Assert.Equal(0L, empty.Count($"SELECT COUNT(*) FROM pg_tables WHERE schemaname = '{empty.Schema}'"));
        Assert.Equal(0, CliRun.Run("migrate", "--db", empty.Address).Exit);
        Assert.True(empty.Count($"SELECT COUNT(*) FROM pg_tables WHERE schemaname = '{empty.Schema}'") > 5);
    }

    [ServerFact]
    public void ASchemaFromANewerVersion_IsRefusedNamingBoth_BeforeAnythingIsWritten()
    {
        var database = Schema();
        Assert.Equal(0, CliRun.Run("import", Register(), "--db", database.Address).Exit);
        database.Scalar("INSERT INTO \"__EFMigrationsHistory\" VALUES ('20991231000000_FromTheFuture', '99.0.0')");

        foreach (var args in new[] { new[] { "check" }, ["import", Trips("t.csv", 2, 0)], ["migrate"] })
        {
            var (exit, _, error) = CliRun.Run([.. args, "--db", database.Address]);
            Assert.Equal(2, exit);
            Assert.Matches(@"was written by a newer version of TripTestLog \(its schema is 20991231000000_FromTheFuture; this version, [0-9.]+, "
                + @"knows up to \d{14}_\w+\); use that version or a newer one", CliRun.Unwrapped(error));
        }

        Assert.Equal(1L, database.Count("SELECT COUNT(*) FROM source_files"));
    }

    [ServerFact]
    public void AWaitOnTheServersImportLock_IsSaid_AndEndsAtTheLabPolicysBound_InOneSentence()
    {
        var database = Schema();
        Assert.Equal(0, CliRun.Run("import", Register(), "--db", database.Address).Exit);
        File.WriteAllText(Path.Combine(_folder, "lab-policy.conf"), "store_wait_minutes = 0.05\n");
        using var holder = new NpgsqlConnection(TestDatabase.Server);
        holder.Open();

        // The lock a frozen importer would hold: "TTLimpt" (PostgresRecordStore's import lock).
        Execute(holder, "SELECT pg_advisory_lock(23736585206722676)");

        using var importer = Child.StartIn(_folder, null, null, "import", Trips("t.csv", 5, 0), "--db", database.Address);
        Assert.Equal(2, importer.Exit(TimeSpan.FromSeconds(90)));
        Assert.Contains("waiting for another import on ", CliRun.Unwrapped(importer.Error), StringComparison.Ordinal);
        Assert.Contains("held the server's import lock longer than 3 seconds, so nothing of this file was stored", CliRun.Unwrapped(importer.Error), StringComparison.Ordinal);
        Assert.Equal(0L, database.Count("SELECT COUNT(*) FROM trip_tests"));
    }

    [ServerFact]
    public void AConnectionTheServerEndsMidImport_IsNamedAsSuch_AndNothingOfTheFileIsStored()
    {
        var database = Schema();
        Assert.Equal(0, CliRun.Run("import", Register(), "--db", database.Address).Exit);
        var application = "ttl-end-" + _suffix;
        using var importer = Child.StartWith(null, null, "import", Trips("big.csv", 300_000, 0), "--db",
            database.Address + ";Application Name=" + application);
        Assert.True(Child.WaitFor(() => database.Count($"SELECT COUNT(*) FROM pg_stat_activity WHERE application_name = '{application}' "
            + "AND backend_xid IS NOT NULL") > 0 || importer.HasExited, TimeSpan.FromSeconds(120)), "the import never started writing");
        Assert.False(importer.HasExited, "the import finished before the server could end it");

        database.Scalar($"SELECT COUNT(pg_terminate_backend(pid)) FROM pg_stat_activity WHERE application_name = '{application}'");

        Assert.Equal(2, importer.Exit(TimeSpan.FromSeconds(90)));
        Assert.Contains("the database server closed the connection during the command; nothing of the file in progress was stored", CliRun.Unwrapped(importer.Error),
            StringComparison.Ordinal);
        Assert.DoesNotContain("Broken pipe", CliRun.Unwrapped(importer.Error), StringComparison.Ordinal);
        Assert.Equal(0L, database.Count("SELECT COUNT(*) FROM trip_tests"));
    }

    private TestDatabase Schema()
    {
        var database = TestDatabase.Create(Provider.Postgres, _folder);
        _databases.Add(database);
        return database;
    }

    private string Role(string kind)
    {
        var role = $"lab_{kind}_{_suffix}";
        using var connection = new NpgsqlConnection(TestDatabase.Server);
        connection.Open();
        Execute(connection, $"CREATE ROLE {role} LOGIN PASSWORD '{Password}'");
        _roles.Add(role);
        return role;
    }

    // The grants of scripts/server-roles.sql, as an administrator runs them with psql -v.
    private static void Grant(string schema, string reader, string importer)
    {
        var script = File.ReadAllText(Repository("scripts", "server-roles.sql"))
            .Replace(":\"schema\"", $"\"{schema}\"", StringComparison.Ordinal)
            .Replace(":\"reader\"", $"\"{reader}\"", StringComparison.Ordinal)
            .Replace(":\"importer\"", $"\"{importer}\"", StringComparison.Ordinal);
        using var connection = new NpgsqlConnection(TestDatabase.Server);
        connection.Open();
        Execute(connection, script);
    }

    private static Child As(string role, TestDatabase database, params string[] args)
    {
        var address = new NpgsqlConnectionStringBuilder(database.Address) { Username = role }.ConnectionString;
        return Child.StartWith(new Dictionary<string, string> { ["PGPASSWORD"] = Password }, null, [.. args, "--db", address]);
    }

    private string Register()
    {
        var path = Path.Combine(_folder, "register.csv");
        File.WriteAllText(path, "asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v\nP-01,Hill Farm,Board 1,iec60898,C,16,1,230\n");
        return path;
    }

    private string Trips(string name, int rows, int offsetSeconds)
    {
        var path = Path.Combine(_folder, name);
        var sb = new StringBuilder("asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start\n");
        for (var i = 0; i < rows; i++)
        {
            var at = new DateTime(2020, 1, 1).AddSeconds(offsetSeconds + i).ToString("yyyy-MM-ddTHH:mm:ss", CultureInfo.InvariantCulture);

            // 40.9 A is 2.56 In of a 16 A curve-C breaker: 10 to 49 s lies inside IEC 60898-1 Table 7's 1 s to 60 s band.
            sb.Append("P-01,").Append(at).Append(",as-found,all,40.9,").Append((10 + (i % 40)).ToString(CultureInfo.InvariantCulture)).Append(",,cold\n");
        }

        File.WriteAllText(path, sb.ToString());
        return path;
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
