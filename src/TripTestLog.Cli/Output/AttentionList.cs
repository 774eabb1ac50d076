using TripTestLog.Application.Check;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Cli.Output;

/// <summary>
/// The tests a console summary names instead of sending the reader to a file: each device with a trip outside its band
/// (its latest such test), and each instrument that was not traceable. Bounded: the first few of each, with a count of the rest.
/// </summary>
internal sealed class AttentionList(int limit) : IVerdictWriter
{
    private readonly Dictionary<string, JudgedTrip> _failures = new(StringComparer.Ordinal);
    private readonly Dictionary<string, string> _instruments = new(StringComparer.Ordinal);
    private long _moreFailures;

    public void Add(JudgedTrip judged)
    {
        var tag = judged.Trip.Tag.Value;
        if (judged.Assessment.Verdict is Verdict.TooEarly or Verdict.TooLate)
        {
            if (_failures.ContainsKey(tag) || _failures.Count < limit)
            {
                _failures[tag] = judged;
            }
            else
            {
                _moreFailures++;
            }
        }

        var instrument = judged.Trip.Measurement.Instrument;
        if (judged.InstrumentFinding is { } why && !_instruments.ContainsKey(instrument) && _instruments.Count < limit)
        {
            _instruments[instrument] = why;
        }
    }

    public void Finish()
    {
    }

    /// <summary>Writes the list, or nothing when nothing needs attention.</summary>
    public void WriteTo(TextWriter writer)
    {
        if (_failures.Count == 0 && _instruments.Count == 0)
        {
            return;
        }

        writer.WriteLine("Needs attention:");
        foreach (var (tag, j) in _failures.OrderBy(f => f.Key, StringComparer.Ordinal))
        {
            var m = j.Trip.Measurement;
            Wrapped.Write(writer, $"{tag}: {Format.Verdict(j.Assessment.Verdict)} on {m.TestedAt.Date:yyyy-MM-dd}, {Format.Outcome(m.Outcome)} at {Format.Multiple(j)}"
                + $" (band {j.Assessment.Band.Range})", 2, 4);
        }

        if (_moreFailures > 0)
        {
            Wrapped.Write(writer, $"... and {_moreFailures} more tests outside their band (see the verdicts file)", 2, 4);
        }

        foreach (var (instrument, why) in _instruments.OrderBy(i => i.Key, StringComparer.Ordinal))
        {
            Wrapped.Write(writer, $"{why} (tests made with {instrument} cannot be traced)", 2, 4);
        }
    }
}
