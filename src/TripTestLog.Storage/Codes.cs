using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Storage;

/// <summary>The text codes enums are stored as: the same words the record files use.</summary>
internal static class Codes
{
    public static string Of(TestStage stage) => stage == TestStage.AsFound ? "as-found" : "as-left";

    public static TestStage Stage(string code) => code == "as-found" ? TestStage.AsFound : TestStage.AsLeft;

    public static string Of(StartCondition start) => start == StartCondition.Cold ? "cold" : "warm";

    public static StartCondition Start(string code) => code == "cold" ? StartCondition.Cold : StartCondition.Warm;

    public static string Of(DeviceFamily family) => family switch
    {
        DeviceFamily.Iec60898 => "iec60898",
        _ => throw new ArgumentOutOfRangeException(nameof(family), family, "no storage code for this family"),
    };

    public static DeviceFamily Family(string code) => code switch
    {
        "iec60898" => DeviceFamily.Iec60898,
        _ => throw new InvalidDataException($"the store holds an unknown device family '{code}'"),
    };

    public static TripCurve Curve(string code) => Enum.Parse<TripCurve>(code);
}
