using TripTestLog.Application.Text;
using TripTestLog.Application.Import;
using TripTestLog.Application.Check;
using TripTestLog.Application.Records;
using System.Globalization;

namespace TripTestLog.Cli.Output;

/// <summary>The summary a person reads after an import: one line per file, totals, then every problem.</summary>
internal static class ImportReport
{
    /// <summary>At most this many problems are printed per refused file; the log keeps them all.</summary>
    public const int ProblemsShownPerFile = 20;

    public static void Write(TextWriter writer, IReadOnlyList<ImportOutcome> outcomes, string logPath, int maxWidth = Wrapped.Width)
    {
        // Columns that are zero for every file are left out, so the table stays narrow; the sentence below names them all.
        var counts = new (string Header, Func<ImportOutcome, long> Count, bool Always)[]
        {
            ("Rows", o => o.RowsRead, true),
            ("Added", o => o.Added, true),
            ("Updated", o => o.Updated, false),
            ("Unchanged", o => o.Unchanged, false),
            ("Duplicates", o => o.Duplicates, true),
            ("Replaced", o => o.Replaced, false),
            ("Not tested", o => o.NotTested, false),
            ("Refused", o => o.RefusedRows, true),
        }.Where(c => c.Always || outcomes.Any(o => c.Count(o) != 0)).ToList();
        var table = new TextTable(
            [TextColumn.Left("File", shortening: Shortening.Front), TextColumn.Left("Kind"), TextColumn.Left("Result"), .. counts.Select(c => TextColumn.Right(c.Header))]);
        foreach (var o in outcomes)
        {
            table.Add([
                o.File,
                o.Kind is { } k ? Kind(k) : "unknown",
                o.Status switch { ImportStatus.Imported => "imported", ImportStatus.AlreadyImported => "already imported", _ => "REFUSED" },
                .. counts.Select(c => c.Count(o).ToString(CultureInfo.InvariantCulture))]);
        }

        table.WriteTo(writer, maxWidth);
        var imported = outcomes.Count(o => o.Status == ImportStatus.Imported);
        var again = outcomes.Count(o => o.Status == ImportStatus.AlreadyImported);
        var refused = outcomes.Where(o => o.Status == ImportStatus.Refused).ToList();
        writer.WriteLine();
        Wrapped.Write(writer, $"{outcomes.Count} {(outcomes.Count == 1 ? "file" : "files")}: {imported} imported, {again} already imported, {refused.Count} refused; "
            + $"{outcomes.Where(o => o.Status == ImportStatus.Imported).Sum(o => o.Added)} records added.", 0);
        if (outcomes.Any(o => o.RowsRead > 0))
        {
            Wrapped.Write(writer, "Every row is accounted for: rows = added + updated + unchanged + duplicates + replaced + not tested + refused.", 0);
        }

        if (outcomes.Sum(o => o.NotTested) is > 0 and var blank)
        {
            Wrapped.Write(writer, $"{blank} planned {(blank == 1 ? "row was" : "rows were")} left blank on a worksheet: counted as not tested, not stored.", 0);
        }

        // A copy under another name is named with the file it repeats, so nobody looks for a missing import.
        foreach (var o in outcomes.Where(o => o.Status == ImportStatus.AlreadyImported && o.EarlierFile is { } e && e != o.File))
        {
            Wrapped.Write(writer, $"{o.File} holds the same content as {o.EarlierFile}, imported before: nothing added.", 0, 2);
        }

        foreach (var o in outcomes.Where(o => o.Status == ImportStatus.Imported && o.Correction is not null))
        {
            var c = o.Correction!;
            Wrapped.Write(writer, $"{o.File} corrects {c.File}: {c.Replaced} {(c.Replaced == 1 ? "record" : "records")} took new values "
                + $"(old ones in the audit table), {c.Unchanged} unchanged, {o.Added} added"
                + (c.Kept == 0 ? "." : $"; {c.Kept} of its {(c.Kept == 1 ? "records is" : "records are")} not in the correction and stayed stored, "
                    + $"citing {c.File} at {(c.Kept == 1 ? "line" : "lines")} {string.Join(", ", c.KeptLines)}{(c.Kept > c.KeptLines.Count ? ", ..." : "")}."), 0, 2);
        }

        foreach (var o in outcomes.Where(o => o.Status == ImportStatus.Imported && o.RefusedRows > 0))
        {
            writer.WriteLine();
            Wrapped.Write(writer, $"{o.File}: {Counted.Of(o.RefusedRows, "row")} refused, the rest stored."
                + (o.RejectsFile is { } rejects ? $" The refused rows, with their reasons, are in {rejects}:" : ""), 0, 2);
            WriteProblems(writer, o, logPath);
        }

        foreach (var o in refused)
        {
            writer.WriteLine();
            Wrapped.Write(writer, $"{o.File} was refused: nothing from it was stored. Fix these and import it again:", 0, 2);
            WriteProblems(writer, o, logPath);
        }
    }

    // One cause, one message: the first problem of each cause in full, then how many more rows share it and where.
    private static void WriteProblems(TextWriter writer, ImportOutcome o, string logPath)
    {
        var groups = o.Problems
            .GroupBy(p => p.Cause ?? p.Column + "\n" + p.Reason, StringComparer.Ordinal)
            .ToList();
        foreach (var g in groups.Take(ProblemsShownPerFile))
        {
            var first = g.First();
            Wrapped.Write(writer, first.ToString(), 2, 4);
            var others = g.Skip(1).ToList();
            if (others.Count > 0)
            {
                // One problem a row: "rows" and the lines of the others; several in a row: "values" and every line they are on.
                var rowsOnly = g.Select(p => p.Line).Distinct().Count() == g.Count();
                var what = rowsOnly ? (others.Count == 1 ? "row" : "rows") : (others.Count == 1 ? "value" : "values");
                var lines = (rowsOnly ? others : g.ToList()).Select(p => p.Line).ToList();
                Wrapped.Write(writer, $"and {others.Count} more {what} like it ({Lines(lines)})", 4, 6);
            }
        }

        if (groups.Count > ProblemsShownPerFile || o.ProblemsOmitted > 0)
        {
            var rest = groups.Skip(ProblemsShownPerFile).Sum(g => g.Count()) + o.ProblemsOmitted;
            var inLog = o.ProblemsOmitted > 0 ? $"the first {o.Problems.Count} are in {logPath}" : $"all are in {logPath}";
            Wrapped.Write(writer, $"... and {rest} more {(rest == 1 ? "problem" : "problems")} ({inLog})", 2, 4);
        }
    }

    /// <summary>Line numbers in order as ranges: "line 4", "lines 4-9", "lines 4-6, 9, 12-14"; the first ten runs, then "...".</summary>
    public static string Lines(IReadOnlyCollection<long> lines)
    {
        var sorted = lines.Distinct().Order().ToList();
        var runs = new List<string>();
        for (var i = 0; i < sorted.Count; i++)
        {
            var start = sorted[i];
            while (i + 1 < sorted.Count && sorted[i + 1] == sorted[i] + 1)
            {
                i++;
            }

            runs.Add(start == sorted[i] ? start.ToString(CultureInfo.InvariantCulture) : $"{start}-{sorted[i]}");
        }

        var text = string.Join(", ", runs.Take(10)) + (runs.Count > 10 ? ", ..." : "");
        return (sorted.Count == 1 ? "line " : "lines ") + text;
    }

    public static string Kind(RecordKind kind) => kind switch
    {
        RecordKind.DeviceRegister => "register",
        RecordKind.TripTests => "trip tests",
        RecordKind.ContactResistance => "contact",
        RecordKind.InsulationResistance => "insulation",
        RecordKind.CurveTable => "curve table",
        RecordKind.AmbientTable => "ambient table",
        _ => "instruments",
    };
}
