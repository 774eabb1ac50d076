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

    /// <summary>The parameter names of <see cref="Columns"/>, in order; a dialect writes their placeholders.</summary>
    public static readonly string[] Parameters =
    [
        "site", "location", "family", "curve", "rated", "poles", "voltage", "commissioned", "limit", "make", "model", "serial",
        "settings", "from", "table", "refamb", "ambtable", "criticality",
    ];

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
        // The rows come ordered by tag, so each device's entries are gathered in one list and made a history when the tag changes.
        var histories = new Dictionary<string, DeviceHistory>(AssetTag.Comparer);
        var entries = new List<Device>();
        while (r.Read())
        {
            var device = Read(r);
            if (entries.Count > 0 && !AssetTag.Comparer.Equals(entries[0].Tag.Value, device.Tag.Value))
            {
                Add(histories, entries);
                entries = [];
            }

            entries.Add(device);
        }

        if (entries.Count > 0)
        {
            Add(histories, entries);
        }

        return histories;
    }

    private static void Add(Dictionary<string, DeviceHistory> histories, List<Device> entries)
    {
        var tag = entries[0].Tag.Value;
        if (histories.TryGetValue(tag, out var earlier))
        {
            // Not expected (the query orders by tag), kept so an unordered reader still gives whole histories.
            entries.InsertRange(0, earlier.Entries);
        }

        histories[tag] = new DeviceHistory(entries);
    }

    /// <summary>Sets <see cref="Parameters"/> to a device's values; an empty one is sent typed as its column.</summary>
    public static void Bind(StoreDialect dialect, DbCommand command, Device d)
    {
        dialect.Set(command, "site", d.Site);
        dialect.Set(command, "location", d.Location);
        dialect.Set(command, "family", Codes.Of(d.Family));
        dialect.Set(command, "curve", d.Settings switch { Iec60898Settings s => s.Curve.ToString(), RelaySettings s => CurveCodes.Of(s.Curve), _ => "" });
        dialect.Set(command, "rated", d.RatedCurrent.Value);
        dialect.Set(command, "poles", d.Poles);
        dialect.Set(command, "voltage", d.RatedVoltage.Value);
        dialect.SetText(command, "commissioned", d.CommissionedOn?.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture));
        dialect.SetNumber(command, "limit", d.ContactLimit?.Value);
        dialect.Set(command, "make", d.Make);
        dialect.Set(command, "model", d.Model);
        dialect.Set(command, "serial", d.Serial);
        dialect.Set(command, "settings", SettingsCodec.Write(d.Settings));
        dialect.SetText(command, "from", d.SettingsFrom?.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture));
        dialect.SetText(command, "table", d.CurveTable);
        dialect.SetNumber(command, "refamb", d.ReferenceAmbient?.Value);
        dialect.SetText(command, "ambtable", d.AmbientTable);
        dialect.Set(command, "criticality", d.Criticality);
    }

    private static DateOnly? Date(DbDataReader r, int i) =>
        r.IsDBNull(i) ? null : DateOnly.ParseExact(r.GetString(i), "yyyy-MM-dd", CultureInfo.InvariantCulture);
}
