using TripTestLog.Application.Records;
namespace TripTestLog.Ingest.Columns;

/// <summary>The columns of one record kind, version 1 of the formats. The README documents the same lists.</summary>
internal sealed record RecordSchema(RecordKind Kind, IReadOnlyList<ColumnSpec> Columns, IReadOnlyList<string> Signature)
{
    /// <summary>
    /// A worksheet's label for a planned row (T1, C1, I1 ...). A row that carries one and leaves every result column blank
    /// is a test not made: counted, never stored.
    /// </summary>
    public const string PlanColumn = "plan";

    /// <summary>The columns that hold a measurement's result, for each kind that a worksheet plans.</summary>
    public static IReadOnlyList<string> ResultColumns(RecordKind kind) => kind switch
    {
        RecordKind.TripTests => ["trip_time", "held"],
        RecordKind.ContactResistance or RecordKind.InsulationResistance => ["resistance"],
        _ => [],
    };

    private static ColumnSpec Req(string name, Quantity q = Quantity.None) => new(name, q, true);

    private static ColumnSpec Opt(string name, Quantity q = Quantity.None) => new(name, q, false);

    public static RecordSchema Register { get; } = new(
        RecordKind.DeviceRegister,
        [
            Req("asset_tag"), Req("site"), Req("location"), Req("family"), Opt("curve"),
            Req("rated_current", Quantity.Current), Req("poles", Quantity.Count), Req("rated_voltage", Quantity.Voltage),
            Opt("commissioned_on"), Opt("contact_limit", Quantity.ContactResistance), Opt("make"), Opt("model"), Opt("serial"),
            Opt("settings_from"), Opt("ir", Quantity.Current), Opt("tr", Quantity.Time), Opt("tr_ref_multiple"),
            Opt("isd", Quantity.Current), Opt("tsd", Quantity.Time), Opt("tsd_i2t"), Opt("ii", Quantity.Current), Opt("im", Quantity.Current),
            Opt("pickup", Quantity.Current), Opt("tms"), Opt("highset", Quantity.Current), Opt("highset_delay", Quantity.Time),
            Opt("opening_time", Quantity.Time), Opt("time_tolerance_pct"), Opt("time_tolerance_min", Quantity.Time),
            Opt("pickup_tolerance_pct"), Opt("inst_max", Quantity.Time), Opt("curve_table"),
            Opt("reference_ambient", Quantity.Temperature), Opt("ambient_table"), Opt("supply"), Opt("thermal_memory"),
            Opt("criticality"),
        ],
        ["family", "rated_current", "rated_voltage", "commissioned_on"]);

    public static RecordSchema Trip { get; } = new(
        RecordKind.TripTests,
        [
            Req("asset_tag"), Req("tested_at"), Req("stage"), Req("pole"), Req("current", Quantity.Current),
            Opt("trip_time", Quantity.Time), Opt("held", Quantity.Time), Req("start"), Opt("ambient", Quantity.Temperature),
            Opt("instrument"), Opt("technician"), Opt("note"),
            Opt("ir", Quantity.Current), Opt("isd", Quantity.Current), Opt("ii", Quantity.Current), Opt("im", Quantity.Current),
            Opt("pickup", Quantity.Current), Opt("tms"), Opt(PlanColumn),
        ],
        ["trip_time", "held", "start"]);

    public static RecordSchema Contact { get; } = new(
        RecordKind.ContactResistance,
        [
            Req("asset_tag"), Req("tested_at"), Req("stage"), Req("pole"), Req("resistance", Quantity.ContactResistance),
            Req("test_current", Quantity.Current), Opt("temperature", Quantity.Temperature), Opt("instrument"), Opt("technician"),
            Opt(PlanColumn),
        ],
        ["test_current"]);

    public static RecordSchema Insulation { get; } = new(
        RecordKind.InsulationResistance,
        [
            Req("asset_tag"), Req("tested_at"), Req("stage"), Req("path"), Req("test_voltage", Quantity.Voltage),
            Req("resistance", Quantity.InsulationResistance), Opt("temperature", Quantity.Temperature), Opt("duration", Quantity.Time),
            Opt("instrument"), Opt(PlanColumn),
        ],
        ["path", "test_voltage"]);

    public static RecordSchema CurveTable { get; } = new(
        RecordKind.CurveTable,
        [Req("table"), Req("multiple"), Req("min", Quantity.Time), Req("max", Quantity.Time)],
        ["table", "multiple"]);

    public static RecordSchema AmbientTable { get; } = new(
        RecordKind.AmbientTable,
        [Req("table"), Req("ambient", Quantity.Temperature), Req("current_factor")],
        ["table", "current_factor"]);

    public static RecordSchema Instruments { get; } = new(
        RecordKind.InstrumentRegister,
        [Req("instrument"), Req("kind"), Req("serial"), Req("calibrated_on"), Req("calibration_due"),
            Opt("time_accuracy_pct"), Opt("time_accuracy_s"), Opt("current_accuracy_pct"), Opt("current_accuracy_a"),
            Opt("resistance_accuracy_pct"), Opt("resistance_accuracy_uohm"), Opt("insulation_accuracy_pct"), Opt("coverage_factor")],
        ["calibrated_on", "calibration_due"]);

    public static IReadOnlyList<RecordSchema> All { get; } = [Register, Trip, Contact, Insulation, CurveTable, AmbientTable, Instruments];

    public ColumnSpec? Find(string name) => Columns.FirstOrDefault(c => c.Name == name);
}
