using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Storage;

/// <summary>The text codes enums are stored as, from <see cref="TextCodes"/>; decoding a stored value is strict.</summary>
internal static class Codes
{
    public static string Of(TestStage stage) => TextCodes.Stage.Of(stage);

    public static TestStage Stage(string code) => TextCodes.Stage.Decode(code);

    public static string Of(StartCondition start) => TextCodes.Start.Of(start);

    public static StartCondition Start(string code) => TextCodes.Start.Decode(code);

    public static string Of(DeviceFamily family) => TextCodes.Family.Of(family);

    public static DeviceFamily Family(string code) => TextCodes.Family.Decode(code);
}
