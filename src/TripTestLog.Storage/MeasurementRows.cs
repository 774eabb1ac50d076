using System.Globalization;
using TripTestLog.Domain.Measurements;
using TripTestLog.Application.Records;

namespace TripTestLog.Storage;

/// <summary>One measurement as the values of its table's columns, ready to insert, compare or update.</summary>
/// <param name="Values">The values, aligned with <see cref="MeasurementTable.Columns"/>.</param>
/// <param name="Fingerprint">The record's content hash.</param>
/// <param name="Line">The line of the file it came from.</param>
internal sealed record MeasurementRow(object[] Values, string Fingerprint, long Line);

/// <summary>
/// A measurement table and the columns a row of it holds (besides id, source and fingerprint): the one list of them.
/// Rows are written, hashed, compared and read back in this order; a test holds it equal to the EF model's columns.
/// </summary>
/// <param name="Table">The table name.</param>
/// <param name="Alias">The table's alias in the reading queries.</param>
/// <param name="Columns">The value columns, in order (the order fingerprints are made in).</param>
/// <param name="TrailingOptional">How many of the last columns are usually empty, so an insert may leave them out.</param>
/// <param name="UnhashedWhenEmpty">
/// How many of the last columns were added after records were stored: left out of the fingerprint while empty, so a
/// record stored before keeps its fingerprint.
/// </param>
internal sealed record MeasurementTable(string Table, string Alias, string[] Columns, int TrailingOptional = 0, int UnhashedWhenEmpty = 0)
{
    /// <summary>Where every measurement table holds its test time among <see cref="Columns"/>: second, after the device.</summary>
    public const int TestedAtColumn = 1;

    public static MeasurementTable Trips { get; } = new("trip_tests", "t",
    [
        "device_id", "tested_at", "stage", "pole", "current_a", "tripped", "time_s", "start", "ambient_c", "instrument", "technician", "note",
        "found_ir_a", "found_isd_a", "found_ii_a", "found_im_a", "found_pickup_a", "found_tms",
    ], TrailingOptional: 6);

    public static MeasurementTable Contacts { get; } = new("contact_tests", "c",
        ["device_id", "tested_at", "stage", "pole", "resistance_uohm", "test_current_a", "temperature_c", "instrument", "technician"]);

    public static MeasurementTable Insulations { get; } = new("insulation_tests", "i",
        ["device_id", "tested_at", "stage", "path", "test_voltage_v", "resistance_mohm", "over_range", "temperature_c", "duration_s", "instrument"],
        UnhashedWhenEmpty: 1);

    /// <summary>The table measurements of <paramref name="kind"/> are stored in.</summary>
    public static MeasurementTable For(RecordKind kind) => kind switch
    {
        RecordKind.TripTests => Trips,
        RecordKind.ContactResistance => Contacts,
        RecordKind.InsulationResistance => Insulations,
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, "not a measurement kind"),
    };

    /// <summary>
    /// The columns a reading query selects (the device joined as d): the device's asset tag where the row holds its id,
    /// then the other value columns, then the source file and line. A value column keeps its place in <see cref="Columns"/>.
    /// </summary>
    public string Selected => string.Join(", ", ["d.asset_tag", .. Columns.Skip(1).Select(c => Alias + "." + c), Alias + ".source_file_id", Alias + ".source_line"]);

    /// <summary>Where <paramref name="column"/> stands in a row of <see cref="Selected"/>.</summary>
    public int Ordinal(string column) => column switch
    {
        "asset_tag" => 0,
        "source_file_id" => Columns.Length,
        "source_line" => Columns.Length + 1,
        _ => Array.IndexOf(Columns, column) is > 0 and var i ? i : throw new ArgumentOutOfRangeException(nameof(column), column, $"not a column of {Table}"),
    };

    /// <summary>A measurement table's name, checked: it is written into SQL.</summary>
    public static string Checked(string name) => name is "trip_tests" or "contact_tests" or "insulation_tests"
        ? name
        : throw new ArgumentOutOfRangeException(nameof(name), name, "not a measurement table");

    /// <summary>A measurement as a stored row of its table.</summary>
    public static MeasurementRow RowOf(MeasurementRecord measurement, long deviceId, long line) => measurement switch
    {
        TripRecord t => Trip(t.Trip, deviceId, line),
        ContactRecord c => Contact(c.Contact, deviceId, line),
        InsulationRecord i => Insulation(i.Insulation, deviceId, line),
        _ => throw new ArgumentOutOfRangeException(nameof(measurement), measurement.GetType().Name, "not a measurement"),
    };

    /// <summary>One trip test as a stored row of <see cref="Trips"/>.</summary>
    public static MeasurementRow Of(TripMeasurement trip, long deviceId, long line) => Trip(trip, deviceId, line);

    /// <summary>A value as text for comparing a stored row with a new one and for the audit table.</summary>
    public static string Text(object? value) => value switch
    {
        null or DBNull => "",
        double d => d.ToString("R", CultureInfo.InvariantCulture),
        bool b => b ? "1" : "0",
        _ => Convert.ToString(value, CultureInfo.InvariantCulture) ?? "",
    };

    private static MeasurementRow Trip(TripMeasurement m, long device, long line)
    {
        var f = m.FoundSettings;
        object[] values =
        [
            device, m.TestedAt.ToString(), Codes.Of(m.Stage), m.Pole.Code, m.Current.Value, m.Outcome.Tripped, m.Outcome.Time.Value,
            Codes.Of(m.Start), Db(m.Ambient?.Value), m.Instrument, m.Technician, m.Note,
            Db(f?.Ir?.Value), Db(f?.Isd?.Value), Db(f?.Ii?.Value), Db(f?.Im?.Value), Db(f?.Pickup?.Value), Db(f?.Tms),
        ];
        return new MeasurementRow(values, Fingerprint.Of(Trips, values), line);
    }

    private static MeasurementRow Contact(ContactMeasurement m, long device, long line)
    {
        object[] values =
        [
            device, m.TestedAt.ToString(), Codes.Of(m.Stage), m.Pole.Code, m.Resistance.Value, m.TestCurrent.Value,
            Db(m.Temperature?.Value), m.Instrument, m.Technician,
        ];
        return new MeasurementRow(values, Fingerprint.Of(Contacts, values), line);
    }

    private static MeasurementRow Insulation(InsulationMeasurement m, long device, long line)
    {
        object[] values =
        [
            device, m.TestedAt.ToString(), Codes.Of(m.Stage), m.Path, m.TestVoltage.Value, m.Resistance.Value.Value, m.Resistance.OverRange,
            Db(m.Temperature?.Value), Db(m.Duration?.Value), m.Instrument,
        ];
        return new MeasurementRow(values, Fingerprint.Of(Insulations, values), line);
    }

    private static object Db(double? value) => value is { } v ? v : DBNull.Value;
}
