using Microsoft.EntityFrameworkCore;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Storage;

public sealed partial class RecordStore
{
    /// <summary>How many records of each kind the store holds.</summary>
    public StoreCounts Counts() => new(
        _context.SourceFiles.LongCount(),
        _context.Devices.LongCount(),
        _context.TripTests.LongCount(),
        _context.ContactTests.LongCount(),
        _context.InsulationTests.LongCount());

    /// <summary>Every device in the register, by asset tag.</summary>
    public IReadOnlyList<Device> Devices()
    {
        using var select = _connection.CreateCommand();
        select.CommandText = $"SELECT asset_tag, {RegisterColumns} FROM devices ORDER BY asset_tag";
        using var reader = select.ExecuteReader();
        var devices = new List<Device>();
        while (reader.Read())
        {
            devices.Add(DeviceMapping.Read(reader));
        }

        return devices;
    }

    /// <summary>How many stored revisions the register entry of <paramref name="tag"/> has, oldest first.</summary>
    public int RevisionCount(AssetTag tag) =>
        (from r in _context.DeviceRevisions
         join d in _context.Devices on r.DeviceId equals d.Id
         where d.AssetTag == tag.Value
         select r.Id).Count();

    /// <summary>Every trip test with its device, ordered by asset tag, then test time, then file line; optionally for one device.</summary>
    public IReadOnlyList<StoredTrip> Trips(AssetTag? only = null)
    {
        using var select = _connection.CreateCommand();
        select.CommandText =
            $"SELECT d.asset_tag, {string.Join(", ", RegisterColumns.Split(", ").Select(c => "d." + c))}, "
            + "t.tested_at, t.stage, t.pole, t.current_a, t.tripped, t.time_s, t.start, t.ambient_c, t.instrument, t.technician, t.note, "
            + "f.file_name, t.source_line "
            + "FROM trip_tests t JOIN devices d ON d.id = t.device_id JOIN source_files f ON f.id = t.source_file_id "
            + (only is null ? "" : "WHERE d.asset_tag = $tag ")
            + "ORDER BY d.asset_tag, t.tested_at, f.id, t.source_line";
        if (only is { } tag)
        {
            select.Parameters.AddWithValue("$tag", tag.Value);
        }

        using var r = select.ExecuteReader();
        var trips = new List<StoredTrip>();
        var devices = new Dictionary<string, Device>(StringComparer.Ordinal);
        while (r.Read())
        {
            var tagText = r.GetString(0);
            if (!devices.TryGetValue(tagText, out var device))
            {
                device = DeviceMapping.Read(r);
                devices[tagText] = device;
            }

            const int m = 13;
            var time = Seconds.Of(r.GetDouble(m + 5));
            var measurement = new TripMeasurement(
                device.Tag,
                TestedAt.Parse(r.GetString(m)),
                Codes.Stage(r.GetString(m + 1)),
                Pole.Parse(r.GetString(m + 2)),
                Amperes.Of(r.GetDouble(m + 3)),
                r.GetBoolean(m + 4) ? TripOutcome.TrippedAfter(time) : TripOutcome.HeldFor(time),
                Codes.Start(r.GetString(m + 6)),
                r.IsDBNull(m + 7) ? null : Celsius.Of(r.GetDouble(m + 7)),
                r.GetString(m + 8),
                r.GetString(m + 9),
                r.GetString(m + 10));
            trips.Add(new StoredTrip(device, measurement, r.GetString(m + 11), r.GetInt64(m + 12)));
        }

        return trips;
    }

    /// <summary>The contact resistance readings of one device, oldest first.</summary>
    public IReadOnlyList<ContactMeasurement> Contacts(AssetTag tag) =>
        (from c in _context.ContactTests.AsNoTracking()
         join d in _context.Devices on c.DeviceId equals d.Id
         where d.AssetTag == tag.Value
         orderby c.TestedAt, c.Pole
         select c).AsEnumerable()
        .Select(c => new ContactMeasurement(
            tag, TestedAt.Parse(c.TestedAt), Codes.Stage(c.Stage), Pole.Parse(c.Pole), MicroOhms.Of(c.ResistanceUohm),
            Amperes.Of(c.TestCurrentA), c.TemperatureC is { } t ? Celsius.Of(t) : null, c.Instrument, c.Technician))
        .ToList();

    /// <summary>The number of insulation readings stored for one device.</summary>
    public int InsulationCount(AssetTag tag) =>
        (from i in _context.InsulationTests
         join d in _context.Devices on i.DeviceId equals d.Id
         where d.AssetTag == tag.Value
         select i.Id).Count();

}
