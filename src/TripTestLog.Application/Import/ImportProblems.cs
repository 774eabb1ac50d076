using TripTestLog.Application.Records;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Application.Import;

/// <summary>The words of the problems the import rules find, written once.</summary>
internal static class ImportProblems
{
    public static RowProblem UnknownTag(string path, long line, AssetTag tag) => new(path, line, "asset_tag",
        $"asset tag '{tag}' is not in the device register; import a register that lists it first, or correct the tag");

    public static RowProblem SameDateTwice(string path, long line, AssetTag tag, long firstLine) => new(path, line, "asset_tag",
        $"asset tag '{tag}' is already listed on line {firstLine} with other values and the same settings_from; keep one entry per device and date");
}
