using TripTestLog.Application.Stores;
using TripTestLog.Application.Import;
using TripTestLog.Application.Check;
using Serilog;
using TripTestLog.Application.Records;
using TripTestLog.Ingest;

namespace TripTestLog.Cli.Services;

/// <summary>A file to import and the way to read it.</summary>
/// <param name="Path">The file.</param>
/// <param name="Read">Separator, decimal mark, size limit, profile.</param>
internal sealed record ImportFile(string Path, ReadOptions Read)
{
    /// <summary>
    /// How records cite the file: its path relative to the folder given to import (alder-ridge/2026-trip-tests.csv), or
    /// for a file given by itself, the path as given. Always with '/' separators.
    /// </summary>
    public string Name { get; init; } = Path.Replace(System.IO.Path.DirectorySeparatorChar, '/');
}

/// <summary>
/// Imports files and folders: finds the CSV files, reads each, and stores it in its own transaction.
/// Registers go first so that measurement files in the same run find their devices.
/// </summary>
internal sealed class ImportRunner(IRecordStore store, ILogger log, CliContext cli)
{
    private readonly List<ImportOutcome> _finished = [];

    /// <summary>The file being stored when <see cref="Run"/> stopped, or null when none was.</summary>
    public string? InProgress { get; private set; }

    /// <summary>The files finished before the one in progress, in the order stored.</summary>
    public IReadOnlyList<ImportOutcome> Finished => _finished;

    /// <summary>
    /// Expands folders to the *.csv files inside them (recursively, sorted, rejects files skipped). A *.profile.json in a
    /// folder applies to the files its patterns name; <paramref name="baseOptions"/>' own profile, when given, applies to all.
    /// </summary>
    /// <remarks>An entry of a folder that cannot be read as a file (a link to nothing, a loop of links) is added to
    /// Skipped by name, and the folder's other files are imported.</remarks>
    public static (List<ImportFile> Files, List<string> Problems, List<string> Skipped) Expand(IEnumerable<string> paths, ReadOptions baseOptions)
    {
        var files = new List<ImportFile>();
        var problems = new List<string>();
        var skipped = new List<string>();
        var profiles = new Dictionary<string, IReadOnlyList<ColumnProfile>>(StringComparer.Ordinal);
        ColumnProfile? ProfileFor(string file) => FolderProfiles(Path.GetDirectoryName(Path.GetFullPath(file))!, profiles, problems)
            .FirstOrDefault(p => p.AppliesTo(Path.GetFileName(file)));
        foreach (var path in paths)
        {
            if (File.Exists(path))
            {
                files.Add(new ImportFile(path, baseOptions.Profile is null ? baseOptions with { Profile = ProfileFor(path) } : baseOptions));
            }
            else if (Directory.Exists(path))
            {
                foreach (var file in FolderWalk.CsvFiles(path, skipped).Where(f => !f.EndsWith(RejectsFile.Suffix, StringComparison.OrdinalIgnoreCase)))
                {
                    files.Add(new ImportFile(file, baseOptions.Profile is null ? baseOptions with { Profile = ProfileFor(file) } : baseOptions)
                    {
                        Name = System.IO.Path.GetRelativePath(path, file).Replace(System.IO.Path.DirectorySeparatorChar, '/'),
                    });
                }
            }
            else
            {
                problems.Add($"{path}: no such file or folder");
            }
        }

        return (files.DistinctBy(f => Path.GetFullPath(f.Path)).ToList(), problems.Distinct().ToList(), skipped);
    }

    /// <summary>
    /// Reads and stores every file, reporting progress; returns one outcome per file, in the order stored. Records dated
    /// after <paramref name="today"/> are refused.
    /// </summary>
    public IReadOnlyList<ImportOutcome> Run(IReadOnlyList<ImportFile> files, ImportOptions options, DateOnly today)
    {
        using var progress = Progress.For(cli, files.Count);
        var sources = files.Select(f => (IRecordFileSource)new CsvRecordFileSource(f.Path, f.Read) { Name = f.Name }).ToList();
        foreach (var f in files)
        {
            log.Information("Reading {Name} from {Path}", f.Name, System.IO.Path.GetFullPath(f.Path));
        }

        foreach (var outcome in new ImportPipeline(store).Run(sources, options, today, cli.Clock.GetUtcNow, Starting, cli.Cancel))
        {
            Log(outcome);
            _finished.Add(outcome);
            InProgress = null;
        }

        return _finished;

        void Starting(string file)
        {
            InProgress = file;
            progress.Step(Path.GetFileName(file));
        }
    }

    // Each folder's profiles are read once per import, not once per file.
    private static IReadOnlyList<ColumnProfile> FolderProfiles(string folder, Dictionary<string, IReadOnlyList<ColumnProfile>> cache, List<string> problems)
    {
        if (cache.TryGetValue(folder, out var known))
        {
            return known;
        }

        var loaded = new List<ColumnProfile>();
        foreach (var candidate in Directory.EnumerateFiles(folder, "*.profile.json").Order(StringComparer.Ordinal))
        {
            var (profile, problem) = ColumnProfile.Load(candidate);
            if (problem is not null)
            {
                problems.Add(problem);
            }
            else
            {
                loaded.Add(profile!);
            }
        }

        cache[folder] = loaded;
        return loaded;
    }

    private void Log(ImportOutcome o)
    {
        log.Information("Import {File} kind {Kind}: {Status}, {Rows} rows, {Added} added, {Updated} updated, {Duplicates} duplicates, {Refused} refused, {Replaced} replaced",
            o.File, o.Kind, o.Status, o.RowsRead, o.Added, o.Updated, o.Duplicates, o.RefusedRows, o.Replaced);
        foreach (var problem in o.Problems)
        {
            log.Warning("Refused {Problem}", problem.ToString());
        }

        if (o.ProblemsOmitted > 0)
        {
            log.Warning("{File}: {Omitted} further problems not listed", o.File, o.ProblemsOmitted);
        }
    }
}
