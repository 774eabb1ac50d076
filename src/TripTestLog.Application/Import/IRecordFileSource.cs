using TripTestLog.Application.Records;

namespace TripTestLog.Application.Import;

/// <summary>A record file waiting to be imported, and the way to read it (an ingest adapter implements it).</summary>
public interface IRecordFileSource
{
    /// <summary>The file's path, to read it from.</summary>
    string Path { get; }

    /// <summary>How records and problems cite the file: its path relative to the folder given to import, or as given.</summary>
    string Name { get; }

    /// <summary>The file's kind from its header alone, or null when not recognised; cheap, so an import can order files.</summary>
    RecordKind? PeekKind();

    /// <summary>Opens the file for one streaming pass; dates after <paramref name="today"/> are refused as future dates.</summary>
    IRecordFile Open(DateOnly today);
}
