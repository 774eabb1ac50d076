using TripTestLog.Domain.Envelopes;

namespace TripTestLog.Application.Records;

/// <summary>One row of a curve table file: which table, and the point.</summary>
/// <param name="Table">The table's name.</param>
/// <param name="Point">The row.</param>
public sealed record CurveTableRow(string Table, CurveTablePoint Point);
