namespace TripTestLog.Storage;

/// <summary>The record file's name for a measurement table's column: what the person who wrote the file sees.</summary>
internal static class RecordColumn
{
    /// <summary>The file's column for <paramref name="column"/>; <paramref name="tripped"/> tells trip_time_s from held_s.</summary>
    public static string Of(string column, bool tripped) => column switch
    {
        "device_id" => "asset_tag",
        "time_s" => tripped ? "trip_time_s" : "held_s",
        "tripped" => "trip_time_s/held_s",
        "over_range" => "resistance_mohm",
        _ when column.StartsWith("found_", StringComparison.Ordinal) => column["found_".Length..],
        _ => column,
    };
}
