using TripTestLog.Application.Streams;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Application.Check;

/// <summary>
/// Judges every stored trip test, device by device, with the register entry in force on its date, and yields each
/// judgement as it is made: memory holds one device's tests at a time, however large the fleet.
/// </summary>
public static class CheckPipeline
{
    /// <summary>
    /// The judged tests of every device (or of <paramref name="only"/>), in asset-tag and test-time order;
    /// <paramref name="requireRegisteredInstruments"/> makes an instrument missing from the register a finding;
    /// <paramref name="ambientNoteKelvin"/> is the lab policy's ambient warning, <paramref name="pointWindow"/> its
    /// test-current tolerance around a standard's point (a fraction); <paramref name="decision"/> its decision rule and
    /// default accuracies (null: simple acceptance).
    /// </summary>
    public static IEnumerable<JudgedTrip> Run(ITripSource source, AssetTag? only = null, bool requireRegisteredInstruments = false,
        CancellationToken cancel = default, double ambientNoteKelvin = LabPolicy.AmbientNoteKelvin, double pointWindow = LabPolicy.PointWindow,
        Domain.Verdicts.DecisionPolicy? decision = null)
    {
        ArgumentNullException.ThrowIfNull(source);
        var judge = DeviceJudge.For(source, requireRegisteredInstruments, ambientNoteKelvin, pointWindow, decision);
        // The store is read two devices ahead on another thread, so reading and judging overlap on two cores. Not more:
        // a device read further ahead outlives a few collections and is promoted, and at 8 ahead a 1 M-row check made
        // twice the gen2 collections (855 against 470) for no more overlap; 1 ahead overlapped too little.
        foreach (var device in ReadAhead.Of(source.Devices(only), 2, cancel))
        {
            cancel.ThrowIfCancellationRequested();
            foreach (var judged in judge.Judge(device))
            {
                yield return judged;
            }
        }
    }
}
