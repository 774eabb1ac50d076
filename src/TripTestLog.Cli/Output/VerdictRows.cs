using TripTestLog.Application.Check;

namespace TripTestLog.Cli.Output;

/// <summary>
/// The verdict row of the test last asked for, kept for the next writer of the same test: a report writes each test
/// to its CSV file and then its JSON file, and the row made for the one serves the other. One per set of writers, used
/// from the thread that writes them.
/// </summary>
internal sealed class VerdictRows
{
    private JudgedTrip? _trip;
    private VerdictJson.VerdictRow _row;

    /// <summary>The row of <paramref name="trip"/>, made only when it is not the test last asked for.</summary>
    public VerdictJson.VerdictRow Of(JudgedTrip trip)
    {
        if (!ReferenceEquals(trip, _trip))
        {
            _row = VerdictJson.Row(trip);
            _trip = trip;
        }

        return _row;
    }
}
