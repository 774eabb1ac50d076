using System.Text;
using System.Text.Json;

namespace TripTestLog.Storage;

/// <summary>
/// Reads a stored <c>settings_json</c> text into the codec's fields with a plain JSON reader. It reads what the
/// serializer writes (snake_case names, absent or null for an empty field) and skips names it does not know, as the
/// serializer would. Not the serializer itself: its metadata for the nullable fields is compiled when first used,
/// which every command that reads a device paid at start-up.
/// </summary>
internal static class SettingsJsonReader
{
    /// <summary>
    /// The fields of <paramref name="json"/>; text that is not a settings object (malformed, or a value of the wrong
    /// type) is refused with <see cref="InvalidDataException"/> naming it, as a stored value that cannot be read.
    /// </summary>
    public static SettingsCodec.Dto Read(string json)
    {
        try
        {
            return Fields(json);
        }
        catch (Exception e) when (e is JsonException or InvalidOperationException or FormatException)
        {
            throw new InvalidDataException($"settings_json cannot be read ({e.Message}): {json}", e);
        }
    }

    private static SettingsCodec.Dto Fields(string json)
    {
        var reader = new Utf8JsonReader(Encoding.UTF8.GetBytes(json));
        if (!reader.Read() || reader.TokenType != JsonTokenType.StartObject)
        {
            throw new InvalidDataException($"settings_json is not a JSON object: {json}");
        }

        var d = new SettingsCodec.Dto();
        while (reader.Read() && reader.TokenType == JsonTokenType.PropertyName)
        {
            var name = reader.GetString();
            reader.Read();
            switch (name)
            {
                case "kind": d.Kind = Text(ref reader) ?? ""; break;
                case "curve": d.Curve = Text(ref reader); break;
                case "ir_a": d.IrA = Number(ref reader); break;
                case "tr_s": d.TrS = Number(ref reader); break;
                case "tr_ref_multiple": d.TrRefMultiple = Number(ref reader); break;
                case "isd_a": d.IsdA = Number(ref reader); break;
                case "tsd_s": d.TsdS = Number(ref reader); break;
                case "tsd_i2t": d.TsdI2t = Flag(ref reader); break;
                case "ii_a": d.IiA = Number(ref reader); break;
                case "im_a": d.ImA = Number(ref reader); break;
                case "pickup_a": d.PickupA = Number(ref reader); break;
                case "tms": d.Tms = Number(ref reader); break;
                case "highset_a": d.HighsetA = Number(ref reader); break;
                case "highset_delay_s": d.HighsetDelayS = Number(ref reader); break;
                case "time_tolerance_pct": d.TimeTolerancePct = Number(ref reader); break;
                case "time_tolerance_min_s": d.TimeToleranceMinS = Number(ref reader); break;
                case "pickup_tolerance_pct": d.PickupTolerancePct = Number(ref reader); break;
                case "opening_time_s": d.OpeningTimeS = Number(ref reader); break;
                case "inst_max_s": d.InstMaxS = Number(ref reader); break;
                case "curve_table": d.CurveTable = Text(ref reader); break;
                case "supply": d.Supply = Text(ref reader); break;
                case "thermal_memory": d.ThermalMemory = Flag(ref reader); break;
                default: reader.Skip(); break;
            }
        }

        if (reader.TokenType != JsonTokenType.EndObject || reader.Read())
        {
            throw new InvalidDataException($"settings_json is not a whole JSON object: {json}");
        }

        return d;
    }

    private static string? Text(ref Utf8JsonReader reader) => reader.TokenType == JsonTokenType.Null ? null : reader.GetString();

    private static double? Number(ref Utf8JsonReader reader) => reader.TokenType == JsonTokenType.Null ? null : reader.GetDouble();

    private static bool? Flag(ref Utf8JsonReader reader) => reader.TokenType == JsonTokenType.Null ? null : reader.GetBoolean();
}
