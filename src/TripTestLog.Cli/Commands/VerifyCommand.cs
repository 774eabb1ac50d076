using TripTestLog.Application.Stores;
using TripTestLog.Cli.Services;
using System.CommandLine;
using TripTestLog.Cli.Output;

namespace TripTestLog.Cli.Commands;

/// <summary>`verify`: the database's own integrity check (SQLite) plus the project's own traceability checks.</summary>
internal static class VerifyCommand
{
    public static Command Create(CliContext cli)
    {
        var db = CommonOptions.ExistingDatabase();
        var wide = new Option<bool>("--wide") { Description = "Show file names whole, however wide" };
        var command = new Command("verify", "Check the database: its integrity and references, every record traced to an imported file, and each file still at hand unchanged")
        {
            db, wide,
        };
        command.SetAction(parse => Run(cli, parse.GetValue(db)!, parse.GetValue(wide) ? int.MaxValue : Wrapped.Width));
        return command;
    }

    private static int Run(CliContext cli, StoreAddress db, int width)
    {
        if (CommonOptions.Missing(cli, db))
        {
            return ExitCodes.BadInput;
        }

        try
        {
            return Report(cli, db, width);
        }
        catch (Microsoft.Data.Sqlite.SqliteException e) when (e.SqliteErrorCode is Damaged or NotADatabase)
        {
            // A damaged file is what verify looks for: a fault found, not a command that failed.
            cli.Out.WriteLine($"The database is damaged: {db.Display} ({e.Message.ReplaceLineEndings(" ").Trim()}); "
                + "restore it from a backup, or re-import its files into a new database.");
            return ExitCodes.Findings;
        }
    }

    // SQLite's result codes for a file whose pages no longer hold (SQLITE_CORRUPT) or that is no database (SQLITE_NOTADB).
    private const int Damaged = 11;
    private const int NotADatabase = 26;

    private static int Report(CliContext cli, StoreAddress db, int width)
    {
        using var store = Stores.Open(cli, db, StorePurpose.Read);
        var report = store.Verify();
        var table = new TextTable(TextColumn.Left("File", shortening: Shortening.Front), TextColumn.Right("Records"), TextColumn.Left("State"));
        foreach (var f in report.Files)
        {
            table.Add(f.Path, f.Records.ToString(), f.State switch
            {
                SourceFileState.Matches => "unchanged",
                SourceFileState.Changed => "CHANGED since import",
                SourceFileState.Superseded => "corrected, imported again later",
                _ => "not at hand",
            });
        }

        table.WriteTo(cli.Out, width);
        cli.Out.WriteLine();
        cli.Out.WriteLine(report.IntegrityCheck is { } check
            ? $"{check}: {(report.IntegrityErrors.Count == 0 ? "ok" : string.Join("; ", report.IntegrityErrors))}"
            : "Page checks: left to the server's administrator (PostgreSQL's amcheck and data checksums)");
        cli.Out.WriteLine($"Foreign keys: {(report.ForeignKeyErrors == 0 ? "ok" : $"{report.ForeignKeyErrors} broken references")}");
        cli.Out.WriteLine($"Records without an imported file: {report.UntracedRecords}");
        cli.Out.WriteLine($"Records whose values no longer match their fingerprint (changed outside the tool): {report.AlteredRecords}");
        foreach (var example in report.AlteredExamples.Take(20))
        {
            Wrapped.Write(cli.Out, example, 2, 4);
        }

        if (report.AlteredRecords > 20)
        {
            cli.Out.WriteLine($"  ... and {report.AlteredRecords - 20} more");
        }

        var changed = report.Files.Count(f => f.State == SourceFileState.Changed);
        var away = report.Files.Count(f => f.State == SourceFileState.NotAtHand);
        var corrected = report.Files.Count(f => f.State == SourceFileState.Superseded);
        cli.Out.WriteLine($"Imported files: {report.Files.Count}, {changed} changed since import, {corrected} corrected and imported again, {away} not at hand to check.");
        cli.Out.WriteLine(report.Sound ? "The database is sound." : "The database needs attention: see above.");
        return report.Sound ? ExitCodes.Ok : ExitCodes.Findings;
    }
}
