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

    public static string Of(DeviceFamily family) => FamilyCodes.Of(family);

    public static DeviceFamily Family(string code) =>
        FamilyCodes.TryParse(code, out var family) ? family : throw new InvalidDataException($"the store holds an unknown device family '{code}'");
}
