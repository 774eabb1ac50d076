using TripTestLog.Application.Import;
using TripTestLog.Application.Records;

namespace TripTestLog.Storage;

/// <summary>A row of a correction that differs from the record on the same line of the earlier file it corrects.</summary>
/// <param name="New">The new row.</param>
/// <param name="StoredId">The stored record it would replace.</param>
/// <param name="Old">The stored values, aligned with the table's columns.</param>
/// <param name="OldSourceId">The source file the stored record came from.</param>
/// <param name="OldFile">That file's name.</param>
/// <param name="Columns">The table's columns.</param>
internal sealed record Correction(MeasurementRow New, long StoredId, object[] Old, long OldSourceId, string OldFile, string[] Columns)
{
    /// <summary>The columns whose values differ (<see cref="RecordChanges"/>), with old and new text.</summary>
    public IEnumerable<(string Column, string Old, string New)> Changes =>
        RecordChanges.Between(Columns, [.. Columns.Select((c, i) => Shown(c, Old[i]))], [.. Columns.Select((c, i) => Shown(c, New.Values[i]))]);

    /// <summary>Asset tags by device id: a change of device is written with the tags a person knows, never the ids.</summary>
    public IReadOnlyDictionary<long, string>? Tags { get; init; }

    /// <summary>The record the new row was first stored as, removed when the correction is applied to the old one.</summary>
    public long AddedId { get; init; }

    private string Shown(string column, object value) =>
        column == "device_id" && Tags is { } tags && value is long id && tags.TryGetValue(id, out var tag) ? tag : MeasurementTable.Text(value);
}
