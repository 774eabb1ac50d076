using TripTestLog.Application.Import;
using TripTestLog.Application.Records;

namespace TripTestLog.Ingest;

/// <summary>A CSV record file to import, with the options it is read with.</summary>
/// <param name="Path">The file.</param>
/// <param name="Options">Separator, decimal mark, size limit, profile.</param>
public sealed record CsvRecordFileSource(string Path, ReadOptions Options) : IRecordFileSource
{
    /// <inheritdoc />
    public string Name { get; init; } = Path;

    /// <inheritdoc />
    public RecordKind? PeekKind() => RecordFileReader.KindOf(Path, Options);

    /// <inheritdoc />
    public IRecordFile Open(DateOnly today) => CsvRecordFile.Open(Path, today, Options, Name);
}
