using TripTestLog.Application.Stores;
using TripTestLog.Storage.Entities;

namespace TripTestLog.Storage;

/// <summary>The project's check of imported files, for every store: is each file still at its path, unchanged?</summary>
internal static class ImportedFiles
{
    /// <summary>Each file's state, oldest first, with the records it brought (<paramref name="counts"/>, by source id).</summary>
    public static List<VerifiedFile> Check(IReadOnlyList<SourceFileRow> rows, IReadOnlyDictionary<long, long> counts)
    {
        // Each path is hashed once. A file whose content now is that of a later import of the same path was corrected
        // through the tool (import --replace, or a fixed rejects file), which is no fault.
        var byPath = rows.ToLookup(f => f.FullPath, StringComparer.Ordinal);
        var current = byPath.ToDictionary(g => g.Key, g => HashOf(g.Key), StringComparer.Ordinal);
        return [.. rows.Select(f => new VerifiedFile(f.FileName, f.Sha256,
            current[f.FullPath] is not { } now ? SourceFileState.NotAtHand
            : now == f.Sha256 ? SourceFileState.Matches
            : byPath[f.FullPath].Any(later => later.Id > f.Id && later.Sha256 == now) ? SourceFileState.Superseded
            : SourceFileState.Changed,
            counts.GetValueOrDefault(f.Id)))];
    }

    private static string? HashOf(string path)
    {
        if (!File.Exists(path))
        {
            return null;
        }

        using var stream = File.OpenRead(path);
        return Convert.ToHexStringLower(System.Security.Cryptography.SHA256.HashData(stream));
    }
}
