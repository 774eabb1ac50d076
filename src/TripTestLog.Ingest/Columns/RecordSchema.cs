using TripTestLog.Domain.Records;
namespace TripTestLog.Ingest.Columns;

/// <summary>The columns of one record kind, version 1 of the formats. The README documents the same lists.</summary>
internal sealed record RecordSchema(RecordKind Kind, IReadOnlyList<ColumnSpec> Columns, IReadOnlyList<string> Signature)
{
    private static ColumnSpec Req(string name, Quantity q = Quantity.None) => new(name, q, true);

    private static ColumnSpec Opt(string name, Quantity q = Quantity.None) => new(name, q, false);

    public static RecordSchema Register { get; } = new(
        RecordKind.DeviceRegister,
        [
            Req("asset_tag"), Req("site"), Req("location"), Req("family"), Opt("curve"),
            Req("rated_current", Quantity.Current), Req("poles", Quantity.Count), Req("rated_voltage", Quantity.Voltage),
            Opt("commissioned_on"), Opt("contact_limit", Quantity.ContactResistance), Opt("make"), Opt("model"), Opt("serial"),
        ],
        ["family", "rated_current", "rated_voltage", "commissioned_on"]);

    public static RecordSchema Trip { get; } = new(
        RecordKind.TripTests,
        [
            Req("asset_tag"), Req("tested_at"), Req("stage"), Req("pole"), Req("current", Quantity.Current),
            Opt("trip_time", Quantity.Time), Opt("held", Quantity.Time), Req("start"), Opt("ambient", Quantity.Temperature),
            Opt("instrument"), Opt("technician"), Opt("note"),
        ],
        ["trip_time", "held", "start"]);

    public static RecordSchema Contact { get; } = new(
        RecordKind.ContactResistance,
        [
            Req("asset_tag"), Req("tested_at"), Req("stage"), Req("pole"), Req("resistance", Quantity.ContactResistance),
            Req("test_current", Quantity.Current), Opt("temperature", Quantity.Temperature), Opt("instrument"), Opt("technician"),
        ],
        ["test_current"]);

    public static RecordSchema Insulation { get; } = new(
        RecordKind.InsulationResistance,
        [
            Req("asset_tag"), Req("tested_at"), Req("stage"), Req("path"), Req("test_voltage", Quantity.Voltage),
            Req("resistance", Quantity.InsulationResistance), Opt("temperature", Quantity.Temperature), Opt("duration", Quantity.Time),
        ],
        ["path", "test_voltage"]);

    public static IReadOnlyList<RecordSchema> All { get; } = [Register, Trip, Contact, Insulation];

    public ColumnSpec? Find(string name) => Columns.FirstOrDefault(c => c.Name == name);
}
