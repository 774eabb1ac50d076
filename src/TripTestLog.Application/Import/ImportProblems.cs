using TripTestLog.Application.Records;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Application.Import;

/// <summary>The words of the problems the import rules find, written once.</summary>
internal static class ImportProblems
{
    /// <summary>A tag the register does not hold; <paramref name="near"/> is the register's closest tag, when one is close.</summary>
    public static RowProblem UnknownTag(string path, long line, AssetTag tag, string? near) => new(path, line, "asset_tag",
        near is null
            ? $"asset tag '{tag}' is not in the device register; import a register that lists it first, or correct the tag"
            : $"asset tag '{tag}' is not in the device register; did you mean {near}? Correct the tag, or import a register that lists it first")
    {
        Cause = "unknown-tag:" + tag.Value.ToUpperInvariant(),
    };

    public static RowProblem SameDateTwice(string path, long line, AssetTag tag, long firstLine) => new(path, line, "asset_tag",
        $"asset tag '{tag}' is already listed on line {firstLine} with other values and the same settings_from; keep one entry per device and date");
}
