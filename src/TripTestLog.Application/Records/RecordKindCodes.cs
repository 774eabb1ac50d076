using TripTestLog.Domain.Codes;

namespace TripTestLog.Application.Records;

/// <summary>The codes a store keeps for each kind of record file: stable words, not the names of enum members.</summary>
public static class RecordKindCodes
{
    /// <summary>The book: one code a kind.</summary>
    public static CodeBook<RecordKind> Book { get; } = new("record kind",
        (RecordKind.DeviceRegister, "device-register"),
        (RecordKind.TripTests, "trip-tests"),
        (RecordKind.ContactResistance, "contact-resistance"),
        (RecordKind.InsulationResistance, "insulation-resistance"),
        (RecordKind.CurveTable, "curve-table"),
        (RecordKind.AmbientTable, "ambient-table"),
        (RecordKind.InstrumentRegister, "instrument-register"));
}
