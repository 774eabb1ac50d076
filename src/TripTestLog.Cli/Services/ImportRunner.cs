using Serilog;
using TripTestLog.Domain.Records;
using TripTestLog.Ingest;
using TripTestLog.Storage;

namespace TripTestLog.Cli.Services;

/// <summary>
/// Imports files and folders: finds the CSV files, reads each, and stores it in its own transaction.
/// Registers go first so that measurement files in the same run find their devices.
/// </summary>
internal sealed class ImportRunner(RecordStore store, ILogger log, CliContext cli)
{
    /// <summary>Expands folders to the *.csv files inside them (recursively), sorted for a repeatable order.</summary>
    public static (List<string> Files, List<string> Missing) Expand(IEnumerable<string> paths)
    {
        var files = new List<string>();
        var missing = new List<string>();
        foreach (var path in paths)
        {
            if (File.Exists(path))
            {
                files.Add(path);
            }
            else if (Directory.Exists(path))
            {
                files.AddRange(Directory.EnumerateFiles(path, "*.csv", SearchOption.AllDirectories).Order(StringComparer.Ordinal));
            }
            else
            {
                missing.Add(path);
            }
        }

        return (files.Distinct().ToList(), missing);
    }

    /// <summary>Reads and stores every file, reporting progress; returns one outcome per file, in the order stored.</summary>
    public IReadOnlyList<ImportOutcome> Run(IReadOnlyList<string> files)
    {
        using var progress = Progress.For(cli, files.Count);

        // Parse everything first: cheap, and it lets the register go in before the tests that need it.
        var parsed = new List<ParsedFile>(files.Count);
        foreach (var file in files)
        {
            progress.Step("reading " + Path.GetFileName(file));
            parsed.Add(RecordFileReader.Read(file, cli.Today));
        }

        var outcomes = new List<ImportOutcome>(files.Count);
        progress.Restart(files.Count);
        foreach (var file in parsed.OrderBy(p => p.Kind == RecordKind.DeviceRegister ? 0 : 1))
        {
            progress.Step("storing " + Path.GetFileName(file.Path));
            var outcome = store.Import(file, cli.Clock.GetUtcNow());
            Log(outcome, file.Sha256);
            outcomes.Add(outcome);
        }

        return outcomes;
    }

    private void Log(ImportOutcome o, string sha)
    {
        log.Information("Import {File} sha256 {Sha} kind {Kind}: {Status}, {Rows} rows, {Added} added, {Updated} updated, {Duplicates} duplicates",
            o.File, sha, o.Kind, o.Status, o.RowsRead, o.Added, o.Updated, o.Duplicates);
        foreach (var problem in o.Problems)
        {
            log.Warning("Refused {Problem}", problem.ToString());
        }
    }
}
