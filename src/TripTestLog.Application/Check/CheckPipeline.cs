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

        // Three stages, each on its own thread: the store is read, each device is judged, and the caller writes. Each
        // stage runs two devices ahead of the next, no more: a device held further ahead outlives a few collections and
        // is promoted (at 8 ahead a 1 M-row check made twice the gen2 collections, 855 against 470). The judge is used
        // by its one stage alone, so it is never called from two threads at once.
        var devices = ReadAhead.Of(source.Devices(only), 2, cancel);
        foreach (var judged in ReadAhead.Of(devices.Select(d => JudgeAll(judge, d, cancel)), 2, cancel))
        {
            // A stop asked for ends the output at a device's end, not after the devices already judged ahead.
            cancel.ThrowIfCancellationRequested();
            foreach (var trip in judged)
            {
                yield return trip;
            }
        }
    }

    private static List<JudgedTrip> JudgeAll(DeviceJudge judge, DeviceRecords device, CancellationToken cancel)
    {
        cancel.ThrowIfCancellationRequested();
        return judge.Judge(device).ToList();
    }
}
