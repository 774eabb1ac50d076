using TripTestLog.Application.Check;

namespace TripTestLog.Cli.Output;

/// <summary>Writes judged trip tests as they come, so output never waits for (or holds) the whole fleet.</summary>
internal interface IVerdictWriter
{
    void Add(JudgedTrip judged);

    void Finish();
}

/// <summary>Sends each judged test to several writers: the demo writes text and JSON in one pass.</summary>
internal sealed class VerdictWriters(params IVerdictWriter[] writers) : IVerdictWriter
{
    public void Add(JudgedTrip judged)
    {
        foreach (var w in writers)
        {
            w.Add(judged);
        }
    }

    public void Finish()
    {
        foreach (var w in writers)
        {
            w.Finish();
        }
    }
}
