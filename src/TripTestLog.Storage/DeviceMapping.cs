using System.Data.Common;
using System.Globalization;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Storage;

/// <summary>
/// Reads and writes a device as asset_tag followed by <see cref="Columns"/>, the same layout in `devices` and
/// `device_revisions`.
/// </summary>
internal static class DeviceMapping
{
    public const string Columns =
        "site, location, family, curve, rated_current_a, poles, rated_voltage_v, commissioned_on, contact_limit_uohm, make, model, serial, "
        + "settings_json, settings_from, curve_table, reference_ambient_c, ambient_table, criticality";

    public const string Parameters =
        "$site, $location, $family, $curve, $rated, $poles, $voltage, $commissioned, $limit, $make, $model, $serial, "
        + "$settings, $from, $table, $refamb, $ambtable, $criticality";

    public static Device Read(DbDataReader r, int first = 0) => new(
        AssetTag.Of(r.GetString(first)),
        r.GetString(first + 1),
        r.GetString(first + 2),
        Codes.Family(r.GetString(first + 3)),
        Amperes.Of(r.GetDouble(first + 5)),
        r.GetInt32(first + 6),
        Volts.Of(r.GetDouble(first + 7)),
        Date(r, first + 8),
        r.IsDBNull(first + 9) ? null : MicroOhms.Of(r.GetDouble(first + 9)),
        r.GetString(first + 10),
        r.GetString(first + 11),
        r.GetString(first + 12),
        SettingsCodec.Read(r.GetString(first + 13)))
    {
        SettingsFrom = Date(r, first + 14),
        CurveTable = r.IsDBNull(first + 15) ? null : r.GetString(first + 15),
        ReferenceAmbient = r.IsDBNull(first + 16) ? null : Celsius.Of(r.GetDouble(first + 16)),
        AmbientTable = r.IsDBNull(first + 17) ? null : r.GetString(first + 17),
        Criticality = r.GetInt32(first + 18),
    };

    /// <summary>Register entries ordered by asset tag, then age (tag first, then <see cref="Columns"/>), as each device's history.</summary>
    public static IReadOnlyDictionary<string, DeviceHistory> Histories(DbDataReader r)
    {
        var entries = new Dictionary<string, List<Device>>(AssetTag.Comparer);
        while (r.Read())
        {
            var device = DeviceMapping.Read(r);
            if (!entries.TryGetValue(device.Tag.Value, out var list))
            {
                entries[device.Tag.Value] = list = [];
            }

            list.Add(device);
        }

        return entries.ToDictionary(kv => kv.Key, kv => new DeviceHistory(kv.Value), AssetTag.Comparer);
    }

    /// <summary>The values for <see cref="Parameters"/>, in order, with their names.</summary>
    public static IEnumerable<(string Name, object Value)> Values(Device d)
    {
        yield return ("$site", d.Site);
        yield return ("$location", d.Location);
        yield return ("$family", Codes.Of(d.Family));
        yield return ("$curve", d.Settings switch { Iec60898Settings s => s.Curve.ToString(), RelaySettings s => CurveCodes.Of(s.Curve), _ => "" });
        yield return ("$rated", d.RatedCurrent.Value);
        yield return ("$poles", d.Poles);
        yield return ("$voltage", d.RatedVoltage.Value);
        yield return ("$commissioned", Db(d.CommissionedOn?.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture)));
        yield return ("$limit", d.ContactLimit is { } l ? l.Value : DBNull.Value);
        yield return ("$make", d.Make);
        yield return ("$model", d.Model);
        yield return ("$serial", d.Serial);
        yield return ("$settings", SettingsCodec.Write(d.Settings));
        yield return ("$from", Db(d.SettingsFrom?.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture)));
        yield return ("$table", Db(d.CurveTable));
        yield return ("$refamb", d.ReferenceAmbient is { } a ? a.Value : DBNull.Value);
        yield return ("$ambtable", Db(d.AmbientTable));
        yield return ("$criticality", d.Criticality);
    }

    private static object Db(string? value) => value is null ? DBNull.Value : value;

    private static DateOnly? Date(DbDataReader r, int i) =>
        r.IsDBNull(i) ? null : DateOnly.ParseExact(r.GetString(i), "yyyy-MM-dd", CultureInfo.InvariantCulture);
}
