using TripTestLog.Domain.Settings;

namespace TripTestLog.Application.Records;

/// <summary>One row of an ambient table file: which table, and the point.</summary>
/// <param name="Table">The table's name.</param>
/// <param name="Point">The row.</param>
public sealed record AmbientTableRow(string Table, AmbientPoint Point);
