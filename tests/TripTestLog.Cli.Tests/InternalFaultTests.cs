using Microsoft.Data.Sqlite;
using TripTestLog.Cli.Tests.Opening;

namespace TripTestLog.Cli.Tests;

/// <summary>
/// A fault in the tool is not a usage error: the real program, reading a database whose schema was changed under it by
/// plain SQL (a required column made nullable and emptied), stops with exit 3 and one sentence, and the log beside the
/// database holds the exception with its stack. Exit codes are the tool's own (docs/commands.md); no outside source.
/// </summary>
public sealed class InternalFaultTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "ttl-fault-" + Guid.NewGuid().ToString("N")[..12]);

    public InternalFaultTests() => Directory.CreateDirectory(_folder);

    public void Dispose()
    {
        SqliteConnection.ClearAllPools();
        Directory.Delete(_folder, recursive: true);
    }

    [Fact]
    public void AReadThatMeetsANullInARequiredColumn_IsAnInternalError_ExitThree_WithTheStackInTheLogOnly()
    {
        var db = OneBreaker.Database(_folder, "altered.db");
        AlterUnderTheTool(db);

        using var child = Child.Start("check", "--db", db);
        var exit = child.Exit(TimeSpan.FromMinutes(2));

        var error = CliRun.Unwrapped(child.Error);
        var log = File.ReadAllText(Path.Combine(_folder, "triptestlog.log"));
        Assert.Equal(3, exit);
        Assert.Equal($"internal error: a fault in triptestlog itself, not in your input, stopped the command; the details are in "
            + $"{Path.Combine(_folder, "triptestlog.log")}: please report it with that file", error);
        Assert.DoesNotContain("   at ", child.Error + child.Out);
        Assert.DoesNotContain("Exception", child.Error + child.Out);
        Assert.Contains("[ERR] internal error in: triptestlog check --db", log);
        Assert.Contains("System.InvalidOperationException", log);
        Assert.Contains("   at TripTestLog.Storage.StoredRows.Trip", log);
        Assert.Contains("exit 3 (internal error)", log);
    }

    [Fact]
    public void AMissingDatabase_StaysAUsageError_ExitTwo_WithNothingAboutAnInternalError()
    {
        var (exit, _, error) = CliRun.Run("check", "--db", Path.Combine(_folder, "none.db"));

        Assert.Equal(2, exit);
        Assert.StartsWith("error: no database at", error, StringComparison.Ordinal);
        Assert.DoesNotContain("internal error", error, StringComparison.Ordinal);
    }

    // The technician column loses its NOT NULL in the stored schema, and one row's technician becomes NULL.
    private static void AlterUnderTheTool(string db)
    {
        using var connection = new SqliteConnection($"Data Source={db};Pooling=False");
        connection.Open();
        using var command = connection.CreateCommand();
        command.CommandText = """
            PRAGMA writable_schema = ON;
            UPDATE sqlite_master SET sql = replace(sql, '"technician" TEXT NOT NULL', '"technician" TEXT NULL') WHERE name = 'trip_tests';
            PRAGMA writable_schema = OFF;
            """;
        command.ExecuteNonQuery();
        connection.Close();
        connection.Open();
        using var update = connection.CreateCommand();
        update.CommandText = "UPDATE trip_tests SET technician = NULL";
        Assert.Equal(1, update.ExecuteNonQuery());
    }
}
