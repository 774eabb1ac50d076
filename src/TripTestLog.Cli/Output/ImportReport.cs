using TripTestLog.Domain.Records;
using TripTestLog.Storage;

namespace TripTestLog.Cli.Output;

/// <summary>The summary a person reads after an import: one line per file, totals, then every problem.</summary>
internal static class ImportReport
{
    /// <summary>At most this many problems are printed per refused file; the log keeps them all.</summary>
    public const int ProblemsShownPerFile = 20;

    public static void Write(TextWriter writer, IReadOnlyList<ImportOutcome> outcomes, string logPath)
    {
        var table = new TextTable("File", "Kind", "Result", "Rows>", "Added>", "Updated>", "Duplicates>", "Refused>");
        foreach (var o in outcomes)
        {
            table.Add(
                Path.GetRelativePath(Directory.GetCurrentDirectory(), o.File),
                o.Kind is { } k ? Kind(k) : "?",
                o.Status switch { ImportStatus.Imported => "imported", ImportStatus.AlreadyImported => "already imported", _ => "REFUSED" },
                o.RowsRead.ToString(),
                o.Added.ToString(),
                o.Updated.ToString(),
                o.Duplicates.ToString(),
                o.Status == ImportStatus.Refused ? o.RowsRead.ToString() : "0");
        }

        table.WriteTo(writer);
        var imported = outcomes.Count(o => o.Status == ImportStatus.Imported);
        var again = outcomes.Count(o => o.Status == ImportStatus.AlreadyImported);
        var refused = outcomes.Where(o => o.Status == ImportStatus.Refused).ToList();
        writer.WriteLine();
        writer.WriteLine($"{outcomes.Count} files: {imported} imported, {again} already imported, {refused.Count} refused; "
            + $"{outcomes.Where(o => o.Status == ImportStatus.Imported).Sum(o => o.Added)} records added.");

        foreach (var o in refused)
        {
            writer.WriteLine();
            writer.WriteLine($"{o.File} was refused: nothing from it was stored. Fix these and import it again:");
            foreach (var p in o.Problems.Take(ProblemsShownPerFile))
            {
                writer.WriteLine("  " + p);
            }

            if (o.Problems.Count > ProblemsShownPerFile)
            {
                writer.WriteLine($"  ... and {o.Problems.Count - ProblemsShownPerFile} more (all are in {logPath})");
            }
        }
    }

    public static string Kind(RecordKind kind) => kind switch
    {
        RecordKind.DeviceRegister => "register",
        RecordKind.TripTests => "trip tests",
        RecordKind.ContactResistance => "contact",
        _ => "insulation",
    };
}
