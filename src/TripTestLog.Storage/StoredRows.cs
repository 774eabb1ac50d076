using System.Data.Common;
using TripTestLog.Application.Check;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Storage;

/// <summary>
/// Stored measurement rows read back into records, for every store: the column layout is the one the reading queries
/// share (asset tag first, the test time second, source file and line after the values). Only the test time is read
/// in the store's own way.
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
        var assetTag = _tags.Of(r.GetString(0));
        var time = Seconds.Of(r.GetDouble(6));
        var anyFound = false;
        for (var i = 14; i <= 19 && !anyFound; i++)
        {
            anyFound = !r.IsDBNull(i);
        }

        var found = anyFound ? new SettingsFound(A(r, 14), A(r, 15), A(r, 16), A(r, 17), A(r, 18), r.IsDBNull(19) ? null : r.GetDouble(19)) : null;
        var measurement = new TripMeasurement(
            assetTag,
            _testedAt(r),
            Codes.Stage(r.GetString(2)),
            Pole.Parse(r.GetString(3)),
            Amperes.Of(r.GetDouble(4)),
            r.GetBoolean(5) ? TripOutcome.TrippedAfter(time) : TripOutcome.HeldFor(time),
            Codes.Start(r.GetString(7)),
            r.IsDBNull(8) ? null : Celsius.Of(r.GetDouble(8)),
            r.GetString(9),
            r.GetString(10),
            r.GetString(11))
        {
            FoundSettings = found is { IsEmpty: false } ? found : null,
        };
        return new StoredTrip(assetTag, measurement, _files[r.GetInt64(12)], r.GetInt64(13));
    }

    public StoredMeasurement<ContactMeasurement> Contact(DbDataReader r) =>
        new(new ContactMeasurement(
            _tags.Of(r.GetString(0)),
            _testedAt(r),
            Codes.Stage(r.GetString(2)),
            Pole.Parse(r.GetString(3)),
            MicroOhms.Of(r.GetDouble(4)),
            Amperes.Of(r.GetDouble(5)),
            r.IsDBNull(6) ? null : Celsius.Of(r.GetDouble(6)),
            r.GetString(7),
            r.GetString(8)), _files[r.GetInt64(9)], r.GetInt64(10));

    public StoredMeasurement<InsulationMeasurement> Insulation(DbDataReader r) =>
        new(new InsulationMeasurement(
            _tags.Of(r.GetString(0)),
            _testedAt(r),
            Codes.Stage(r.GetString(2)),
            r.GetString(3),
            Volts.Of(r.GetDouble(4)),
            new InsulationReading(MegaOhms.Of(r.GetDouble(5)), r.GetBoolean(6)),
            r.IsDBNull(7) ? null : Celsius.Of(r.GetDouble(7)),
            r.IsDBNull(8) ? null : Seconds.Of(r.GetDouble(8))) { Instrument = r.GetString(11) }, _files[r.GetInt64(9)], r.GetInt64(10));

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
}
