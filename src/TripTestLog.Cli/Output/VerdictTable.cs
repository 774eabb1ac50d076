using TripTestLog.Cli.Services;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Cli.Output;

/// <summary>The verdicts as a person reads them: a table, then what needs attention with the reasons, then the caution.</summary>
internal static class VerdictTable
{
    public static void Write(TextWriter writer, IReadOnlyList<CheckedTrip> results)
    {
        var table = new TextTable("Asset", "Tested", "Stage", "Pole", "Start", "Current>", "Multiple>", "Result", "Band min>", "Band max>", "Verdict", "Basis");
        foreach (var r in results)
        {
            var m = r.Trip.Measurement;
            var a = r.Assessment;
            table.Add(
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

        table.WriteTo(writer);
        writer.WriteLine();
        var counts = Enum.GetValues<Verdict>().Select(v => $"{results.Count(r => r.Assessment.Verdict == v)} {Format.Verdict(v)}");
        writer.WriteLine($"{results.Count} trip tests: {string.Join(", ", counts)}.");

        WriteReasons(writer, "Outside the band (act on these):", results.Where(r => r.Assessment.Verdict is Verdict.TooEarly or Verdict.TooLate));
        WriteReasons(writer, "Not assessable (repeat or complete the test):", results.Where(r => r.Assessment.Verdict == Verdict.NotAssessable));
        WriteInstrumentFindings(writer, results.Where(r => r.InstrumentFinding is not null));
        WriteNotes(writer, results.Where(r => r.Assessment.Notes.Count > 0));
        writer.WriteLine();
        writer.WriteLine(Safety.Caution);
    }

    private static void WriteInstrumentFindings(TextWriter writer, IEnumerable<CheckedTrip> results)
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
            var files = string.Join(", ", tests.Select(r => Path.GetFileName(r.Trip.SourceFile)).Distinct());
            writer.WriteLine($"  {group.Key}: {tests.Count} tests of {devices} devices, {dates.Min():yyyy-MM-dd} to {dates.Max():yyyy-MM-dd} [{files}]");
        }
    }

    private static void WriteNotes(TextWriter writer, IEnumerable<CheckedTrip> results)
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
                writer.WriteLine($"  {m.Tag} {m.TestedAt} at {m.Current}: {note}");
            }
        }
    }

    private static void WriteReasons(TextWriter writer, string heading, IEnumerable<CheckedTrip> results)
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
            writer.WriteLine($"  {m.Tag} {m.TestedAt} {Format.Stage(m.Stage)} pole {m.Pole} at {m.Current} ({Format.Multiple(r)}): "
                + $"{Format.Verdict(r.Assessment.Verdict)}: {r.Assessment.Reason} [{Path.GetFileName(r.Trip.SourceFile)}:{r.Trip.SourceLine}]");
        }
    }
}
