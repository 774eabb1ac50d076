using System.Globalization;
using TripTestLog.Application.Records;

namespace TripTestLog.Application.Import;

/// <summary>An imported file as a correction may name it.</summary>
/// <param name="Id">The store's id of the file.</param>
/// <param name="Name">The name its records cite.</param>
/// <param name="FullPath">Where it was read from.</param>
/// <param name="Sha256">Its content hash, lower-case hex.</param>
/// <param name="ImportedAt">When it was imported.</param>
public sealed record EarlierFile(long Id, string Name, string FullPath, string Sha256, DateTimeOffset ImportedAt);

/// <summary>
/// Finds the earlier file a correction names. A correction is a deliberate act on one named file: two files at the
/// same path are different files unless the person says one corrects the other.
/// </summary>
public static class EarlierFiles
{
    /// <summary>Shortest hash prefix accepted as a file's name.</summary>
    public const int ShortestHash = 8;

    /// <summary>
    /// The one file among <paramref name="stored"/> (earlier files of the kind being imported) that
    /// <paramref name="named"/> names: by the name its records cite (or the last part of it), by its full path, or by the start of its SHA-256
    /// (at least <see cref="ShortestHash"/> hex digits). Otherwise the sentence that says why none is chosen.
    /// </summary>
    public static (EarlierFile? File, string? Problem) Find(IEnumerable<EarlierFile> stored, string named, RecordKind kind)
    {
        ArgumentNullException.ThrowIfNull(stored);
        ArgumentNullException.ThrowIfNull(named);
        var full = FullPath(named);
        var hash = named.Length >= ShortestHash && named.All(Uri.IsHexDigit) ? named.ToLowerInvariant() : null;
        var matches = stored.Where(f => f.Name == named || Path.GetFileName(f.Name) == named || f.FullPath == full || (hash is not null && f.Sha256.StartsWith(hash, StringComparison.Ordinal)))
            .DistinctBy(f => f.Id).ToList();
        return matches.Count switch
        {
            1 => (matches[0], null),
            0 => (null, $"--replace names '{named}', but no earlier {Kind(kind)} file has that name, path or hash; "
                + "name the file to correct as its records cite it (see `verify`), by its full path, or by its SHA-256"),
            _ => (null, $"--replace names '{named}', which fits {matches.Count} earlier {Kind(kind)} files: "
                + string.Join("; ", matches.Select(f => $"{f.Name} imported {f.ImportedAt.ToString("yyyy-MM-dd HH:mm", CultureInfo.InvariantCulture)} "
                    + $"(hash {f.Sha256[..12]})")) + "; name one by its hash"),
        };
    }

    private static string? FullPath(string named)
    {
        try
        {
            return Path.GetFullPath(named);
        }
        catch (Exception e) when (e is ArgumentException or NotSupportedException or PathTooLongException)
        {
            return null;
        }
    }

    private static string Kind(RecordKind kind) => kind switch
    {
        RecordKind.TripTests => "trip-test",
        RecordKind.ContactResistance => "contact-resistance",
        RecordKind.InsulationResistance => "insulation-resistance",
        _ => "measurement",
    };
}
