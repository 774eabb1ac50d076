namespace TripTestLog.Application.Import;

/// <summary>What happened to one file on import.</summary>
public enum ImportStatus
{
    /// <summary>The file's records were stored (some may have been duplicates of stored ones).</summary>
    Imported,

    /// <summary>A file with the same SHA-256 was imported before; nothing was added.</summary>
    AlreadyImported,

    /// <summary>The file had problems; nothing from it was stored.</summary>
    Refused,
}
