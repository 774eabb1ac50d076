using TripTestLog.Application.Text;
using TripTestLog.Application.Check;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Cli.Output;

/// <summary>
/// The verdicts as a person reads them: a table, then what needs attention with the reasons, then the caution. The table
/// fits a 100-column terminal (date and time of day, pole, start, multiple, result, band, verdict: per-pole rows and the
/// tests of one day told apart, a long asset tag shortened in its middle with '…'); <c>wide</c> adds the stage, the
/// current and the basis, the full tag, and splits the band into its two edges.
/// </summary>
internal sealed class VerdictTable(TextWriter writer, bool wide = false) : IVerdictWriter
{
    // Fixed widths, so each row is written as it is judged; a longer cell pushes its row out rather than holding the table.
    private static readonly TextColumn[] WideColumns =
    [
        TextColumn.Left("Asset", 12), TextColumn.Left("Tested", 19), TextColumn.Left("Stage", 8), TextColumn.Left("Pole", 4),
        TextColumn.Left("Start", 5), TextColumn.Right("Current", 9), TextColumn.Right("Multiple", 9), TextColumn.Left("Result", 17),
        TextColumn.Right("Band min", 8), TextColumn.Right("Band max", 8), TextColumn.Left("Verdict", 14), TextColumn.Left("Basis", 9),
    ];

    // 11 + 16 + 4 + 5 + 8 + 15 + 13 + 14 and seven gaps of two: 100 columns. The current is in --wide, --csv and --json;
    // the multiple beside the band is what the band is judged on.
    private static readonly TextColumn[] NarrowColumns =
    [
        TextColumn.Left("Asset", AssetWidth, Shortening.Middle), TextColumn.Left("Tested", 16), TextColumn.Left("Pole", 4),
        TextColumn.Left("Start", 5), TextColumn.Right("Multiple", 8), TextColumn.Left("Result", 15), TextColumn.Left("Band", 13),
        TextColumn.Left("Verdict", 14),
    ];

    private const int AssetWidth = 11;

    private readonly TextTable.RowStream _table = new TextTable(wide ? WideColumns : NarrowColumns).StreamTo(writer);
    private readonly VerdictCounts _counts = new();
    private readonly List<JudgedTrip> _attention = [];

    public void Add(JudgedTrip r)
    {
        var m = r.Trip.Measurement;
        var a = r.Assessment;
        if (!wide)
        {
            _table.Add(
                m.Tag.Value,
                m.TestedAt.Local.ToString(m.TestedAt.HasTime ? "yyyy-MM-dd HH:mm" : "yyyy-MM-dd", System.Globalization.CultureInfo.InvariantCulture),
                m.Pole.Code,
                Format.Start(m.Start),
                Format.Multiple(r),
                Format.Outcome(m.Outcome),
                a.Band.HasRequirement ? $"{Format.Minimum(a.Band.Minimum)}-{Format.Maximum(a.Band.Maximum)}" : "-",
                Format.Verdict(a.Verdict));
        }
        else
        {
            _table.Add(
                m.Tag.Value,
                m.TestedAt.ToString(),
                Format.Stage(m.Stage),
                m.Pole.Code,
                Format.Start(m.Start),
                m.Current.ToString(),
                Format.Multiple(r),
                Format.Outcome(m.Outcome),
                a.Band.HasRequirement ? Format.Minimum(a.Band.Minimum) : "-",
                a.Band.HasRequirement ? Format.Maximum(a.Band.Maximum) : "-",
                Format.Verdict(a.Verdict),
                Format.Basis(a.Basis));
        }

        _counts.Add(r);

        // Only what needs attention is kept for the lists after the table; a healthy fleet holds nothing.
        if (a.Verdict != Verdict.Pass || r.InstrumentFinding is not null || a.Notes.Count > 0 || a.Advisories.Count > 0)
        {
            _attention.Add(r);
        }
    }

    public void Finish()
    {
        writer.WriteLine();
        writer.WriteLine(_counts.Summary("Checked"));
        WriteReasons(writer, "Outside the band (act on these):", _attention.Where(r => r.Assessment.Verdict is Verdict.TooEarly or Verdict.TooLate));
        WriteReasons(writer, "Not assessable (repeat or complete the test):", _attention.Where(r => r.Assessment.Verdict == Verdict.NotAssessable));
        WriteInstrumentFindings(writer, _attention.Where(r => r.InstrumentFinding is not null));
        WriteNotes(writer, _attention.Where(r => r.Assessment.Notes.Count > 0));
        WriteAdvisories(writer, _attention.Where(r => r.Assessment.Advisories.Count > 0));
        writer.WriteLine();
        Wrapped.Write(writer, Safety.Caution, 0);
    }

    /// <summary>
    /// <paramref name="text"/> within <paramref name="width"/> characters as the Asset column shows it: a longer one keeps
    /// its first three and its last characters (where tags tell devices apart) around a '…'.
    /// </summary>
    public static string Shortened(string text, int width) => TextColumn.Cut(text, width, Shortening.Middle);

    private void WriteInstrumentFindings(TextWriter writer, IEnumerable<JudgedTrip> results)
    {
        var list = results.ToList();
        if (list.Count == 0)
        {
            return;
        }

        writer.WriteLine();
        writer.WriteLine("Instrument traceability (the verdicts stand, but these measurements are not traceable):");
        foreach (var group in list.GroupBy(r => r.InstrumentFinding!))
        {
            var tests = group.ToList();
            var dates = tests.Select(r => r.Trip.Measurement.TestedAt.Date).ToList();
            var devices = tests.Select(r => r.Trip.Measurement.Tag).Distinct().Count();
            var files = string.Join(", ", tests.Select(r => r.Trip.SourceFile).Distinct());
            Item(writer, $"{group.Key}: {Counted.Of(tests.Count, "test")} of {Counted.Of(devices, "device")}, {dates.Min():yyyy-MM-dd} to {dates.Max():yyyy-MM-dd} [{files}]");
        }
    }

    private void WriteNotes(TextWriter writer, IEnumerable<JudgedTrip> results)
    {
        var list = results.ToList();
        if (list.Count == 0)
        {
            return;
        }

        writer.WriteLine();
        writer.WriteLine("Notes:");
        foreach (var r in list)
        {
            var m = r.Trip.Measurement;
            foreach (var note in r.Assessment.Notes)
            {
                Item(writer, $"{m.Tag} {m.TestedAt} at {m.Current}: {note}");
            }
        }
    }

    private void WriteAdvisories(TextWriter writer, IEnumerable<JudgedTrip> results)
    {
        var list = results.ToList();
        if (list.Count == 0)
        {
            return;
        }

        writer.WriteLine();
        writer.WriteLine("Advisories (passes outside a drawn line; no requirement broken, compare with the maker's curve):");
        foreach (var r in list)
        {
            var m = r.Trip.Measurement;
            foreach (var advisory in r.Assessment.Advisories)
            {
                Item(writer, $"{m.Tag} {m.TestedAt} at {m.Current}: {advisory.Message}");
            }
        }
    }

    private void WriteReasons(TextWriter writer, string heading, IEnumerable<JudgedTrip> results)
    {
        var list = results.ToList();
        if (list.Count == 0)
        {
            return;
        }

        writer.WriteLine();
        writer.WriteLine(heading);
        foreach (var r in list)
        {
            var m = r.Trip.Measurement;
            Item(writer, $"{m.Tag} {m.TestedAt} {Format.Stage(m.Stage)} pole {m.Pole} at {m.Current} ({Format.Multiple(r)}): "
                + $"{Format.Verdict(r.Assessment.Verdict)}: {r.Assessment.Reason} [{r.Trip.SourceFile}:{r.Trip.SourceLine}]");
        }
    }

    // One entry of a list after the table: wrapped to the terminal, or on one line with --wide.
    private void Item(TextWriter writer, string text)
    {
        if (wide)
        {
            writer.WriteLine("  " + text);
        }
        else
        {
            Wrapped.Write(writer, text, 2, 4);
        }
    }
}
