using TripTestLog.Domain.Codes;
using System.Collections.Concurrent;
using System.Text.Json;
using System.Text.Json.Serialization;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Storage;

/// <summary>
/// Device settings stored as one JSON text column (`settings_json`), so a new family adds fields, not table columns.
/// Field names are snake_case and carry their unit; readable with SQLite's json_extract.
/// </summary>
internal static partial class SettingsCodec
{

    public static string Write(DeviceSettings settings) => JsonSerializer.Serialize(settings switch
    {
        Iec60898Settings s => new Dto { Kind = "iec60898", Curve = TextCodes.TripCurve.Of(s.Curve), Supply = s.Supply == Supply.Dc ? TextCodes.Supply.Of(s.Supply) : null },
        ElectronicTripSettings s => new Dto
        {
            Kind = "iec60947-electronic", IrA = s.Ir.Value, TrS = s.Tr.Value, TrRefMultiple = s.TrReferenceMultiple, IsdA = s.Isd?.Value,
            TsdS = s.Tsd?.Value, TsdI2t = s.TsdI2t, IiA = s.Ii?.Value, TimeTolerancePct = s.TimeTolerance.Fraction * 100,
            TimeToleranceMinS = s.TimeTolerance.Floor.Value, InstMaxS = s.InstantaneousMax.Value, ThermalMemory = s.ThermalMemory ? true : null,
        },
        ThermalMagneticSettings s => new Dto { Kind = "iec60947-thermal-magnetic", IrA = s.Ir.Value, ImA = s.Im.Value, InstMaxS = s.InstantaneousMax.Value },
        RelaySettings s => new Dto
        {
            Kind = "relay-idmt", Curve = CurveCodes.Of(s.Curve), PickupA = s.Pickup.Value, Tms = s.Tms, HighsetA = s.HighSet?.Value,
            HighsetDelayS = s.HighSetDelay?.Value, TimeTolerancePct = s.TimeTolerance.Fraction * 100, TimeToleranceMinS = s.TimeTolerance.Floor.Value,
            PickupTolerancePct = s.PickupTolerance * 100, OpeningTimeS = s.OpeningTime.Value,
        },
        CurveTableSettings s => new Dto { Kind = "curve-table", CurveTable = s.Table },
        _ => throw new ArgumentOutOfRangeException(nameof(settings), settings.GetType().Name, "no storage form for these settings"),
    }, SettingsJson.Default.Dto);

    // Settings are immutable records, and a fleet holds few distinct ones (a model's settings repeat across its devices),
    // so each text is parsed once per process; the bound keeps memory flat for a register of all-different settings.
    private const int ReadCacheLimit = 4096;
    private static readonly ConcurrentDictionary<string, DeviceSettings> ReadCache = new(StringComparer.Ordinal);

    /// <summary>The settings a stored <c>settings_json</c> text holds.</summary>
    public static DeviceSettings Read(string json)
    {
        if (ReadCache.TryGetValue(json, out var known))
        {
            return known;
        }

        var settings = Parse(json);
        if (ReadCache.Count < ReadCacheLimit)
        {
            ReadCache.TryAdd(json, settings);
        }

        return settings;
    }

    private static DeviceSettings Parse(string json)
    {
        var d = SettingsJsonReader.Read(json);
        return d.Kind switch
        {
            "iec60898" => new Iec60898Settings(TextCodes.TripCurve.Decode(d.Curve!))
            {
                Supply = d.Supply is null ? Supply.Ac : TextCodes.Supply.Decode(d.Supply),
            },
            "iec60947-electronic" => new ElectronicTripSettings(
                Amperes.Of(d.IrA!.Value), Seconds.Of(d.TrS!.Value), d.TrRefMultiple!.Value, A(d.IsdA), S(d.TsdS), d.TsdI2t ?? false, A(d.IiA),
                TimeTolerance.Of(d.TimeTolerancePct!.Value / 100, Seconds.Of(d.TimeToleranceMinS!.Value)), Seconds.Of(d.InstMaxS!.Value))
            {
                ThermalMemory = d.ThermalMemory ?? false,
            },
            "iec60947-thermal-magnetic" => new ThermalMagneticSettings(Amperes.Of(d.IrA!.Value), Amperes.Of(d.ImA!.Value), Seconds.Of(d.InstMaxS!.Value)),
            "relay-idmt" => new RelaySettings(
                TextCodes.IdmtCurve.Decode(d.Curve!),
                Amperes.Of(d.PickupA!.Value), d.Tms!.Value, A(d.HighsetA), S(d.HighsetDelayS),
                TimeTolerance.Of(d.TimeTolerancePct!.Value / 100, Seconds.Of(d.TimeToleranceMinS!.Value)), d.PickupTolerancePct!.Value / 100,
                Seconds.Of(d.OpeningTimeS!.Value)),
            "curve-table" => new CurveTableSettings(d.CurveTable!),
            _ => throw new InvalidDataException($"unknown settings kind '{d.Kind}' in settings_json"),
        };
    }

    private static Amperes? A(double? value) => value is { } v ? Amperes.Of(v) : null;

    private static Seconds? S(double? value) => value is { } v ? Seconds.Of(v) : null;

    internal sealed class Dto
    {
        public string Kind { get; set; } = "";

        public string? Curve { get; set; }

        public double? IrA { get; set; }

        public double? TrS { get; set; }

        public double? TrRefMultiple { get; set; }

        public double? IsdA { get; set; }

        public double? TsdS { get; set; }

        public bool? TsdI2t { get; set; }

        public double? IiA { get; set; }

        public double? ImA { get; set; }

        public double? PickupA { get; set; }

        public double? Tms { get; set; }

        public double? HighsetA { get; set; }

        public double? HighsetDelayS { get; set; }

        public double? TimeTolerancePct { get; set; }

        public double? TimeToleranceMinS { get; set; }

        public double? PickupTolerancePct { get; set; }

        public double? OpeningTimeS { get; set; }

        public double? InstMaxS { get; set; }

        public string? CurveTable { get; set; }

        // Written only when not the default, so settings stored before these fields existed compare equal.
        public string? Supply { get; set; }

        public bool? ThermalMemory { get; set; }
    }

    // Generated at build time: a command that reads one device's settings starts without building a serializer.
    [JsonSourceGenerationOptions(PropertyNamingPolicy = JsonKnownNamingPolicy.SnakeCaseLower, DefaultIgnoreCondition = JsonIgnoreCondition.WhenWritingNull)]
    [JsonSerializable(typeof(Dto))]
    internal sealed partial class SettingsJson : JsonSerializerContext;
}
