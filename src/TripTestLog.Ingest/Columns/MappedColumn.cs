using TripTestLog.Application.Records;
namespace TripTestLog.Ingest.Columns;

/// <summary>A column of the format found in a file's header: where it is, how it was written, its unit factor.</summary>
/// <param name="Spec">The format's column.</param>
/// <param name="Index">0-based field index in each row.</param>
/// <param name="Header">The header text as written, for messages.</param>
/// <param name="Factor">Multiply the written value by this to get the stored unit.</param>
internal readonly record struct MappedColumn(ColumnSpec Spec, int Index, string Header, double Factor);
