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
    private static readonly (string Header, int Width, bool Right)[] WideColumns =
    [
        ("Asset", 12, false), ("Tested", 19, false), ("Stage", 8, false), ("Pole", 4, false), ("Start", 5, false), ("Current", 9, true),
        ("Multiple", 9, true), ("Result", 17, false), ("Band min", 8, true), ("Band max", 8, true), ("Verdict", 14, false), ("Basis", 9, false),
    ];

    // 11 + 16 + 4 + 5 + 8 + 15 + 13 + 14 and seven gaps of two: 100 columns. The current is in --wide, --csv and --json;
    // the multiple beside the band is what the band is judged on.
    private static readonly (string Header, int Width, bool Right)[] NarrowColumns =
    [
        ("Asset", AssetWidth, false), ("Tested", 16, false), ("Pole", 4, false), ("Start", 5, false), ("Multiple", 8, true), ("Result", 15, false),
        ("Band", 13, false), ("Verdict", 14, false),
    ];

    private const int AssetWidth = 11;

    private (string Header, int Width, bool Right)[] Columns => wide ? WideColumns : NarrowColumns;

    private readonly VerdictCounts _counts = new();
    private readonly List<JudgedTrip> _attention = [];
    private bool _started;

    public void Add(JudgedTrip r)
    {
        if (!_started)
        {
            Row(Columns.Select(c => c.Header).ToArray());
            writer.WriteLine(string.Join("  ", Columns.Select(c => new string('-', c.Width))));
            _started = true;
        }

        var m = r.Trip.Measurement;
        var a = r.Assessment;
        if (!wide)
        {
            Row(
                Shortened(m.Tag.Value, AssetWidth),
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
            Row(
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
    /// <paramref name="text"/> within <paramref name="width"/> characters: a longer one keeps its first three and its last
    /// characters (where tags tell devices apart) around a '…'.
    /// </summary>
    public static string Shortened(string text, int width) =>
        text.Length <= width ? text : text[..3] + "…" + text[^(width - 4)..];

    private void Row(params string[] cells)
    {
        var sb = new System.Text.StringBuilder();
        for (var i = 0; i < cells.Length; i++)
        {
            if (i > 0)
            {
                sb.Append("  ");
            }

            sb.Append(Columns[i].Right ? cells[i].PadLeft(Columns[i].Width) : cells[i].PadRight(Columns[i].Width));
        }

        writer.WriteLine(sb.ToString().TrimEnd());
    }

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
