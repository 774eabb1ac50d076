using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using Microsoft.Data.Sqlite;

namespace TripTestLog.Cli.Tests.Opening;

/// <summary>
/// How a SQLite file is opened: only import creates one, and only where no file exists; a file that is not a TripTestLog
/// database, or one from a newer version, is refused before anything is written; reading commands write nothing, need
/// no write access, and wait for nobody; writers wait for each other as the lab policy says, and say so on stderr.
/// Real files and real processes throughout.
/// </summary>
[System.Runtime.Versioning.SupportedOSPlatform("linux")]
public sealed class SqliteOpeningTests : IDisposable
{
    private static readonly TimeSpan Bound = TimeSpan.FromSeconds(90);
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "ttl-open-" + Guid.NewGuid().ToString("N")[..12]);

    public SqliteOpeningTests() => Directory.CreateDirectory(_folder);

    private string Db => Path.Combine(_folder, "lab.db");

    public void Dispose()
    {
        SqliteConnection.ClearAllPools();
        Directory.Delete(_folder, recursive: true);
    }

    [Theory]
    [InlineData("check")]
    [InlineData("verify")]
    [InlineData("devices")]
    [InlineData("migrate")]
    [InlineData("import")]
    public void ADatabaseFileCutToNothing_IsRefusedInOneSentence_AndStaysAsItWas(string command)
    {
        File.WriteAllBytes(Db, []);

        var (exit, _, error) = CliRun.Run(Args(command));

        Assert.Equal(2, exit);
        Assert.Equal($"error: {Db} is empty (0 bytes), not a TripTestLog database; restore it from a backup, or move it aside and import again",
            CliRun.Unwrapped(error));
        Assert.Equal(0, new FileInfo(Db).Length);
        Assert.Equal(["lab.db"], Directory.GetFiles(_folder).Select(Path.GetFileName).Where(n => n is not ("triptestlog.log" or "t.csv")));
    }

    [Theory]
    [InlineData("check")]
    [InlineData("import")]
    public void AFileThatIsNotADatabase_IsRefused_AndNotTouched(string command)
    {
        File.WriteAllText(Db, "asset_tag,site\nP-01,Hill Farm\n");

        var (exit, _, error) = CliRun.Run(Args(command));

        Assert.Equal(2, exit);
        Assert.Contains("is not a TripTestLog database (it is not a SQLite file)", CliRun.Unwrapped(error), StringComparison.Ordinal);
        Assert.Equal("asset_tag,site\nP-01,Hill Farm\n", File.ReadAllText(Db));
    }

    [Fact]
    public void ASqliteFileOfAnotherProgram_IsNotTakenOver()
    {
        using (var other = new SqliteConnection($"Data Source={Db};Pooling=False"))
        {
            other.Open();
            using var create = other.CreateCommand();
            create.CommandText = "CREATE TABLE notes (id INTEGER PRIMARY KEY, text TEXT)";
            create.ExecuteNonQuery();
        }

        var (exit, _, error) = CliRun.Run(Args("import"));

        Assert.Equal(2, exit);
        Assert.Contains("is a SQLite database but not a TripTestLog one", CliRun.Unwrapped(error), StringComparison.Ordinal);
        Assert.Equal(["notes"], Tables());
    }

    [Theory]
    [InlineData("check")]
    [InlineData("verify")]
    [InlineData("backup")]
    [InlineData("migrate")]
    [InlineData("import")]
    public void ADatabaseFromANewerVersion_IsRefusedNamingBothSchemas_BeforeAnythingIsWritten(string command)
    {
        Imported();
        Sql("INSERT INTO __EFMigrationsHistory (MigrationId, ProductVersion) VALUES ('20991231000000_FromTheFuture', '99.0.0')");
        var before = Hash(Db);

        var (exit, _, error) = CliRun.Run(Args(command));

        Assert.Equal(2, exit);
        Assert.Matches(@"^error: \S+lab\.db was written by a newer version of TripTestLog \(its schema is 20991231000000_FromTheFuture; this version, "
            + @"[0-9.]+, knows up to \d{14}_\w+\); use that version or a newer one\s*$", CliRun.Unwrapped(error));
        Assert.Equal(before, Hash(Db));
    }

    [Fact]
    public void ADatabaseWithAFingerprintSchemeFromANewerVersion_IsRefused()
    {
        Imported();
        Sql("PRAGMA user_version = 9");

        var (exit, _, error) = CliRun.Run(Args("check"));

        Assert.Equal(2, exit);
        Assert.Contains("its schema is fingerprint scheme 9", CliRun.Unwrapped(error), StringComparison.Ordinal);
        Assert.Contains("knows up to fingerprint scheme 2", CliRun.Unwrapped(error), StringComparison.Ordinal);
    }

    [Fact]
    public void AReadingCommand_OnADatabaseThatIsBehind_SaysRunMigrate_AndMigrateBringsItUpToDate()
    {
        File.Copy(Fixture("schema-3.db"), Db);
        var before = Hash(Db);

        var (exit, _, error) = CliRun.Run("check", "--db", Db);

        Assert.Equal(2, exit);
        Assert.Contains("has an older schema (20261201230606_InstrumentsAndAudit; this version needs ", CliRun.Unwrapped(error), StringComparison.Ordinal);
        Assert.Contains($"run `triptestlog migrate --db {Db}` (or an import) first", CliRun.Unwrapped(error), StringComparison.Ordinal);
        Assert.Equal(before, Hash(Db));

        var migrate = CliRun.Run("migrate", "--db", Db);
        Assert.Equal(0, migrate.Exit);
        Assert.StartsWith($"The schema of {Db} is up to date: 9 migrations, the latest ", migrate.Out.ReplaceLineEndings(" "), StringComparison.Ordinal);
        Assert.Equal(0, CliRun.Run("check", "--db", Db).Exit);

        // Migrate also keeps each device's peer places, which the old schema had no table for.
        using var read = new SqliteConnection($"Data Source={Db};Pooling=False;Mode=ReadOnly");
        read.Open();
        using var count = read.CreateCommand();
        count.CommandText = "SELECT (SELECT COUNT(*) FROM devices), (SELECT COUNT(*) FROM peer_stamps)";
        using var counts = count.ExecuteReader();
        Assert.True(counts.Read());
        Assert.True(counts.GetInt64(0) > 0);
        Assert.Equal(counts.GetInt64(0), counts.GetInt64(1));
    }

    [Fact]
    public void AReadingCommand_WritesNothing_AndLeavesTheWriteAheadFilesEmpty()
    {
        Imported();
        var before = Hash(Db);

        Assert.Equal(0, CliRun.Run("check", "--db", Db).Exit);
        Assert.Equal(0, CliRun.Run("verify", "--db", Db).Exit);

        // The file is byte for byte as it was, and the write-ahead log holds nothing (a write would have gone there).
        Assert.Equal(before, Hash(Db));
        Assert.Equal(0, new FileInfo(Db + "-wal").Length);
    }

    /// <summary>
    /// As the Unix user nobody, for whom the operating system makes the file, its folder and its write-ahead files
    /// read-only (they belong to root, mode 644 and 755): check, verify and backup work, create nothing in the folder,
    /// and the owner imports afterwards as before. This proves the access of a real read-only user, not just the mode
    /// the program asks SQLite for. It needs root (to switch users), as CI runs.
    /// </summary>
    [Fact]
    public void AUserWhoMayOnlyReadTheFile_CanCheckVerifyAndBackUp_AndLeavesNothingThatStopsTheOwner()
    {
        Assert.True(Environment.UserName == "root", "this test switches to the user nobody, which needs root");
        Imported();
        File.SetUnixFileMode(_folder, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute | UnixFileMode.GroupRead
            | UnixFileMode.GroupExecute | UnixFileMode.OtherRead | UnixFileMode.OtherExecute);
        var copies = Path.Combine(Path.GetTempPath(), "ttl-open-copies-" + Guid.NewGuid().ToString("N")[..8]);
        Directory.CreateDirectory(copies);
        File.SetUnixFileMode(copies, (UnixFileMode)0x1FF);
        try
        {
            var files = Directory.GetFiles(_folder).Order().ToList();
            foreach (var command in new[] { new[] { "check", "--db", Db }, ["verify", "--db", Db], ["backup", Path.Combine(copies, "copy.db"), "--db", Db] })
            {
                using var reader = Child.StartWith(null, "nobody", command);
                Assert.True(reader.Exit(Bound) == 0, $"{command[0]} as a reader: {reader.Error}");
            }

            Assert.Equal(files, Directory.GetFiles(_folder).Order().ToList());
            Assert.True(File.Exists(Path.Combine(copies, "copy.db")));
            Assert.Equal(0, CliRun.Run("import", Trips("more.csv", 5, 100), "--db", Db).Exit);
        }
        finally
        {
            Directory.Delete(copies, recursive: true);
        }
    }

    [Fact]
    public void AUserWhoMayOnlyRead_IsToldWhenTheWriteAheadFilesAreMissing_InsteadOfCreatingThemAsTheirOwn()
    {
        Assert.True(Environment.UserName == "root", "this test switches to the user nobody, which needs root");
        Imported();
        File.Delete(Db + "-wal");
        File.Delete(Db + "-shm");
        File.SetUnixFileMode(_folder, (UnixFileMode)0x1FF);

        using var reader = Child.StartWith(null, "nobody", "check", "--db", Db);

        Assert.Equal(2, reader.Exit(Bound));
        Assert.Contains($"ask its owner to run `triptestlog migrate --db {Db}` once", CliRun.Unwrapped(reader.Error), StringComparison.Ordinal);
        Assert.False(File.Exists(Db + "-shm"));
    }

    [Fact]
    public void AReader_UnderAHeldWriteLock_ReadsAtOnce_AndSeesOnlyWhatIsCommitted()
    {
        Imported();
        using var writer = HoldWriteLock();
        using (var insert = writer.CreateCommand())
        {
            insert.CommandText = "UPDATE devices SET site = 'Uncommitted'";
            insert.ExecuteNonQuery();
        }

        using var reader = Child.Start("devices", "--db", Db);

        // SQLite's own wait, and the one opening used to take, run to 30 s and more: this bound is well inside it.
        Assert.Equal(0, reader.Exit(TimeSpan.FromSeconds(20)));
        Assert.Contains("Hill Farm", reader.Out, StringComparison.Ordinal);
        Assert.DoesNotContain("Uncommitted", reader.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void ASecondImport_BehindAHeldWriteLock_WaitsPastHalfAMinute_SayingWhatItWaitsFor_ThenFinishes()
    {
        Imported();
        var file = Trips("second.csv", 20, 1000);
        using var importer = HoldAndStart(TimeSpan.FromSeconds(40), out var waited, "import", file, "--db", Db);

        Assert.Equal(0, importer.Exit(Bound));
        Assert.True(waited, "the import never said what it waited for while the lock was held");
        Assert.Contains($"waiting for another process writing to {Db} to finish (up to 10 minutes, lab policy store_wait_minutes)", CliRun.Unwrapped(importer.Error),
            StringComparison.Ordinal);
        Assert.Equal(25L, Count("SELECT COUNT(*) FROM trip_tests"));
    }

    [Fact]
    public void AnImportWhoseWaitRunsOut_SaysSoInOneSentence_AndStoresNothing()
    {
        Imported();
        File.WriteAllText(Path.Combine(_folder, "lab-policy.conf"), "store_wait_minutes = 0.05\n");
        using var writer = HoldWriteLock();

        using var importer = Child.Start("import", Trips("late.csv", 20, 1000), "--db", Db);

        Assert.Equal(2, importer.Exit(Bound));
        Assert.Contains($"error: another process kept {Db} locked for writing longer than 3 seconds; nothing was written", CliRun.Unwrapped(importer.Error),
            StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", CliRun.Unwrapped(importer.Error), StringComparison.Ordinal);
        writer.Dispose();
        Assert.Equal(5L, Count("SELECT COUNT(*) FROM trip_tests"));
    }

    /// <summary>
    /// A row left in EF Core's lock table, as a process killed while upgrading the schema leaves it (planted here: the
    /// upgrade of a small file is over in milliseconds, too fast to kill inside reliably). Without care every later
    /// upgrade waits for it for ever, silently; now import clears it, says so, and finishes.
    /// </summary>
    [Fact]
    public void AMigrationLockLeftByAKilledStartUp_IsClearedAndSaid_AndNeverHangsACommand()
    {
        File.Copy(Fixture("schema-3.db"), Db);
        Sql("CREATE TABLE IF NOT EXISTS \"__EFMigrationsLock\" (\"Id\" INTEGER NOT NULL CONSTRAINT \"PK___EFMigrationsLock\" PRIMARY KEY, \"Timestamp\" TEXT NOT NULL)");
        Sql("INSERT INTO \"__EFMigrationsLock\" (\"Id\", \"Timestamp\") VALUES (1, '2026-12-04 09:00:00+00:00')");

        using (var reader = Child.Start("check", "--db", Db))
        {
            Assert.Equal(2, reader.Exit(TimeSpan.FromSeconds(60)));
            Assert.Contains("run `triptestlog migrate", CliRun.Unwrapped(reader.Error), StringComparison.Ordinal);
        }

        var register = Path.Combine(_folder, "register.csv");
        File.WriteAllText(register, "asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v\nP-01,Hill Farm,Board 1,iec60898,C,16,1,230\n");
        using var importer = Child.Start("import", register, Trips("after.csv", 3, 5000), "--db", Db);

        Assert.True(importer.Exit(TimeSpan.FromSeconds(60)) == 0, importer.Out + importer.Error);
        Assert.Contains("cleared the schema-upgrade lock taken at 2026-12-04 09:00:00+00:00", CliRun.Unwrapped(importer.Error), StringComparison.Ordinal);
        Assert.Equal(0L, Count("SELECT COUNT(*) FROM \"__EFMigrationsLock\""));
        Assert.False(File.Exists(Db + "-migrating"));
    }

    /// <summary>
    /// The same case with a real process: an import upgrading an old database is killed the moment EF Core's lock row
    /// appears (watched from a second connection), so it dies holding the lock, as a power cut would leave it.
    /// </summary>
    [Fact]
    public void AnImportKilledWhileUpgradingTheSchema_LeavesALockThatNoCommandWaitsOnSilently_AndTheNextImportClearsIt()
    {
        var register = Path.Combine(_folder, "register.csv");
        File.WriteAllText(register, "asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v\nP-01,Hill Farm,Board 1,iec60898,C,16,1,230\n");
        var tried = new List<string>();
        var left = false;
        for (var attempt = 0; attempt < 5 && !left; attempt++)
        {
            File.Delete(Db);
            File.Copy(Fixture("schema-3.db"), Db);
            using (var importer = Child.Start("import", register, "--db", Db))
            {
                Assert.True(Child.WaitFor(() => File.Exists(Db + "-migrating") || importer.HasExited, Bound), "the import never started");
                using var watcher = new SqliteConnection($"Data Source={Db};Pooling=False;Mode=ReadOnly");
                watcher.Open();
                using var probe = watcher.CreateCommand();
                probe.CommandText = "SELECT COUNT(*) FROM \"__EFMigrationsLock\"";
                while (!importer.HasExited && (long)probe.ExecuteScalar()! == 0)
                {
                }

                importer.Kill();
            }

            SqliteConnection.ClearAllPools();
            var (locks, applied) = (Count("SELECT COUNT(*) FROM \"__EFMigrationsLock\""), Count("SELECT COUNT(*) FROM \"__EFMigrationsHistory\""));
            tried.Add($"attempt {attempt + 1}: {locks} lock row(s), {applied} migrations");
            left = locks > 0;
        }

        Assert.True(left, "no kill landed while the upgrade held its lock: " + string.Join("; ", tried));
        using (var reader = Child.Start("check", "--db", Db))
        {
            Assert.Equal(2, reader.Exit(TimeSpan.FromSeconds(60)));
            Assert.Contains("run `triptestlog migrate", CliRun.Unwrapped(reader.Error), StringComparison.Ordinal);
        }

        using var again = Child.Start("import", register, Trips("after.csv", 3, 5000), "--db", Db);
        Assert.True(again.Exit(TimeSpan.FromSeconds(60)) == 0, again.Out + again.Error);
        Assert.Contains("cleared the schema-upgrade lock taken at ", CliRun.Unwrapped(again.Error), StringComparison.Ordinal);
        Assert.Equal((0L, 8L), (Count("SELECT COUNT(*) FROM \"__EFMigrationsLock\""), Count("SELECT COUNT(*) FROM trip_tests")));
        Assert.Equal("ok", Text("PRAGMA integrity_check"));
        Assert.False(File.Exists(Db + "-migrating"));
    }

    [Fact]
    public void Check_DuringAFolderImport_ReadsOneSnapshot_AndNeverFails()
    {
        Imported();
        var folder = Path.Combine(_folder, "batch");
        Directory.CreateDirectory(folder);
        for (var i = 0; i < 150; i++)
        {
            File.Move(Trips($"t{i:000}.csv", 40, 10_000 + (i * 100)), Path.Combine(folder, $"t{i:000}.csv"));
        }

        using var importer = Child.Start("import", folder, "--db", Db);
        var checks = 0;
        var failures = new List<string>();
        while (!importer.HasExited && checks < 40)
        {
            var (exit, _, error) = CliRun.Run("check", "--db", Db, "--csv");
            checks++;
            if (exit is not 0 and not 1)
            {
                failures.Add(error);
            }
        }

        Assert.Equal(0, importer.Exit(Bound));
        Assert.True(checks >= 3, $"only {checks} checks ran during the import; make the folder larger");
        Assert.Empty(failures);
    }

    private string[] Args(string command) => command switch
    {
        "import" => ["import", Trips("t.csv", 2, 0), "--db", Db],
        "backup" => ["backup", Path.Combine(_folder, "copy.db"), "--db", Db],
        _ => [command, "--db", Db],
    };

    // A register of one device and five trip tests.
    private void Imported()
    {
        var register = Path.Combine(_folder, "register.csv");
        File.WriteAllText(register, "asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v\nP-01,Hill Farm,Board 1,iec60898,C,16,1,230\n");
        var (exit, _, error) = CliRun.Run("import", register, Trips("first.csv", 5, 0), "--db", Db);
        Assert.True(exit == 0, CliRun.Unwrapped(error));
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

    private SqliteConnection HoldWriteLock()
    {
        var connection = new SqliteConnection($"Data Source={Db};Pooling=False");
        connection.Open();
        using var begin = connection.CreateCommand();
        begin.CommandText = "BEGIN IMMEDIATE";
        begin.ExecuteNonQuery();
        return connection;
    }

    // Starts the command while this test holds the write lock, keeps holding it for `hold`, then lets it go.
    private Child HoldAndStart(TimeSpan hold, out bool waited, params string[] args)
    {
        using var writer = HoldWriteLock();
        var held = System.Diagnostics.Stopwatch.StartNew();
        var child = Child.Start(args);
        waited = Child.WaitFor(() => child.Error.Contains("waiting for another process", StringComparison.Ordinal), hold);
        if (held.Elapsed < hold)
        {
            Thread.Sleep(hold - held.Elapsed);
        }

        Assert.False(child.HasExited, "the second import gave up while the lock was held: " + child.Error);
        return child;
    }

    private void Sql(string sql)
    {
        using var connection = new SqliteConnection($"Data Source={Db};Pooling=False");
        connection.Open();
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        command.ExecuteNonQuery();
    }

    private string Text(string sql)
    {
        using var connection = new SqliteConnection($"Data Source={Db};Pooling=False;Mode=ReadOnly");
        connection.Open();
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        return (string)command.ExecuteScalar()!;
    }

    private long Count(string sql)
    {
        using var connection = new SqliteConnection($"Data Source={Db};Pooling=False;Mode=ReadOnly");
        connection.Open();
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        return (long)command.ExecuteScalar()!;
    }

    private List<string> Tables()
    {
        using var connection = new SqliteConnection($"Data Source={Db};Pooling=False;Mode=ReadOnly");
        connection.Open();
        using var command = connection.CreateCommand();
        command.CommandText = "SELECT name FROM sqlite_master WHERE type = 'table' ORDER BY name";
        using var reader = command.ExecuteReader();
        var names = new List<string>();
        while (reader.Read())
        {
            names.Add(reader.GetString(0));
        }

        return names;
    }

    private static string Hash(string path) => Convert.ToHexString(SHA256.HashData(File.ReadAllBytes(path)));

    private static string Fixture(string name)
    {
        for (var folder = new DirectoryInfo(AppContext.BaseDirectory); folder is not null; folder = folder.Parent)
        {
            var candidate = Path.Combine(folder.FullName, "tests", "TripTestLog.Ingest.Tests", "schemas", name);
            if (File.Exists(candidate))
            {
                return candidate;
            }
        }

        throw new FileNotFoundException($"the schema fixture {name} was not found above {AppContext.BaseDirectory}");
    }
}
