using System.Data.Common;
using TripTestLog.Application.Check;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Storage;

/// <summary>
/// Stored measurement rows read back into records, for every store, in the layout of
/// <see cref="MeasurementTable.Selected"/>: each column found by its name in the table's one column list. Only the
/// test time is read in the store's own way.
/// </summary>
/// <param name="files">Each source file's name, by id.</param>
/// <param name="testedAt">Reads the test time of the current row.</param>
internal sealed class StoredRows(IReadOnlyDictionary<long, string> files, Func<DbDataReader, TestedAt> testedAt)
{
    private readonly IReadOnlyDictionary<long, string> _files = files;
    private readonly Func<DbDataReader, TestedAt> _testedAt = testedAt;
    private readonly TagCache _tags = new();

    public StoredTrip Trip(DbDataReader r)
    {
        var assetTag = _tags.Of(r.GetString(T.Tag));
        var time = Seconds.Of(r.GetDouble(T.Time));
        var anyFound = false;
        for (var i = 0; i < T.Found.Length && !anyFound; i++)
        {
            anyFound = !r.IsDBNull(T.Found[i]);
        }

        var f = T.Found;
        var found = anyFound ? new SettingsFound(A(r, f[0]), A(r, f[1]), A(r, f[2]), A(r, f[3]), A(r, f[4]), r.IsDBNull(f[5]) ? null : r.GetDouble(f[5])) : null;
        var measurement = new TripMeasurement(
            assetTag,
            _testedAt(r),
            Codes.Stage(r.GetString(T.Stage)),
            Pole.Parse(r.GetString(T.Pole)),
            Amperes.Of(r.GetDouble(T.Current)),
            r.GetBoolean(T.Tripped) ? TripOutcome.TrippedAfter(time) : TripOutcome.HeldFor(time),
            Codes.Start(r.GetString(T.Start)),
            r.IsDBNull(T.Ambient) ? null : Celsius.Of(r.GetDouble(T.Ambient)),
            r.GetString(T.Instrument),
            r.GetString(T.Technician),
            r.GetString(T.Note))
        {
            FoundSettings = found is { IsEmpty: false } ? found : null,
        };
        return new StoredTrip(assetTag, measurement, _files[r.GetInt64(T.File)], r.GetInt64(T.Line));
    }

    public StoredMeasurement<ContactMeasurement> Contact(DbDataReader r) =>
        new(new ContactMeasurement(
            _tags.Of(r.GetString(C.Tag)),
            _testedAt(r),
            Codes.Stage(r.GetString(C.Stage)),
            Pole.Parse(r.GetString(C.Pole)),
            MicroOhms.Of(r.GetDouble(C.Resistance)),
            Amperes.Of(r.GetDouble(C.Current)),
            r.IsDBNull(C.Temperature) ? null : Celsius.Of(r.GetDouble(C.Temperature)),
            r.GetString(C.Instrument),
            r.GetString(C.Technician)), _files[r.GetInt64(C.File)], r.GetInt64(C.Line));

    public StoredMeasurement<InsulationMeasurement> Insulation(DbDataReader r) =>
        new(new InsulationMeasurement(
            _tags.Of(r.GetString(I.Tag)),
            _testedAt(r),
            Codes.Stage(r.GetString(I.Stage)),
            r.GetString(I.Path),
            Volts.Of(r.GetDouble(I.Voltage)),
            new InsulationReading(MegaOhms.Of(r.GetDouble(I.Resistance)), r.GetBoolean(I.OverRange)),
            r.IsDBNull(I.Temperature) ? null : Celsius.Of(r.GetDouble(I.Temperature)),
            r.IsDBNull(I.Duration) ? null : Seconds.Of(r.GetDouble(I.Duration))) { Instrument = r.GetString(I.Instrument) }, _files[r.GetInt64(I.File)], r.GetInt64(I.Line));

    private static Amperes? A(DbDataReader r, int i) => r.IsDBNull(i) ? null : Amperes.Of(r.GetDouble(i));

    // A device's tests share one tag value instead of each allocating its own.
    private sealed class TagCache
    {
        private string? _text;
        private AssetTag _tag;

        public AssetTag Of(string text)
        {
            if (!string.Equals(text, _text, StringComparison.Ordinal))
            {
                _text = text;
                _tag = AssetTag.Of(text);
            }

            return _tag;
        }
    }

    // Where each column stands in a row of the table's selected columns, worked out once from its one column list.
    private static class T
    {
        private static readonly MeasurementTable Table = MeasurementTable.Trips;
        public static readonly int Tag = Table.Ordinal("asset_tag"), Stage = Table.Ordinal("stage"), Pole = Table.Ordinal("pole"), Current = Table.Ordinal("current_a"),
            Tripped = Table.Ordinal("tripped"), Time = Table.Ordinal("time_s"), Start = Table.Ordinal("start"), Ambient = Table.Ordinal("ambient_c"),
            Instrument = Table.Ordinal("instrument"), Technician = Table.Ordinal("technician"), Note = Table.Ordinal("note"),
            File = Table.Ordinal("source_file_id"), Line = Table.Ordinal("source_line");

        public static readonly int[] Found =
            [.. new[] { "found_ir_a", "found_isd_a", "found_ii_a", "found_im_a", "found_pickup_a", "found_tms" }.Select(Table.Ordinal)];
    }

    private static class C
    {
        private static readonly MeasurementTable Table = MeasurementTable.Contacts;
        public static readonly int Tag = Table.Ordinal("asset_tag"), Stage = Table.Ordinal("stage"), Pole = Table.Ordinal("pole"),
            Resistance = Table.Ordinal("resistance_uohm"), Current = Table.Ordinal("test_current_a"), Temperature = Table.Ordinal("temperature_c"),
            Instrument = Table.Ordinal("instrument"), Technician = Table.Ordinal("technician"), File = Table.Ordinal("source_file_id"), Line = Table.Ordinal("source_line");
    }

    private static class I
    {
        private static readonly MeasurementTable Table = MeasurementTable.Insulations;
        public static readonly int Tag = Table.Ordinal("asset_tag"), Stage = Table.Ordinal("stage"), Path = Table.Ordinal("path"),
            Voltage = Table.Ordinal("test_voltage_v"), Resistance = Table.Ordinal("resistance_mohm"), OverRange = Table.Ordinal("over_range"),
            Temperature = Table.Ordinal("temperature_c"), Duration = Table.Ordinal("duration_s"), Instrument = Table.Ordinal("instrument"),
            File = Table.Ordinal("source_file_id"), Line = Table.Ordinal("source_line");
    }
}
