using System.Data.Common;
using TripTestLog.Application.Check;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Storage;

/// <summary>
/// The streaming read's merge, for every store: register entries ordered by asset tag (tag first, then the register
/// columns) walked beside the measurement streams in the same order, so one device is held at a time.
/// </summary>
internal static class DeviceWalk
{
    public static IEnumerable<DeviceRecords> Merge(
        DbDataReader entries,
        TagStream<StoredTrip> trips,
        TagStream<StoredMeasurement<ContactMeasurement>>? contacts,
        TagStream<StoredMeasurement<InsulationMeasurement>>? insulation)
    {
        var moreEntries = entries.Read();
        while (moreEntries)
        {
            var tag = entries.GetString(0);
            var history = new List<Device>();
            while (moreEntries && string.Equals(entries.GetString(0), tag, StringComparison.Ordinal))
            {
                history.Add(DeviceMapping.Read(entries));
                moreEntries = entries.Read();
            }

            yield return new DeviceRecords(new DeviceHistory(history), trips.Take(tag))
            {
                Contacts = contacts?.Take(tag) ?? [],
                Insulation = insulation?.Take(tag) ?? [],
            };
        }
    }
}
