using TripTestLog.Application.Records;
using System.Security.Cryptography;

namespace TripTestLog.Ingest;

/// <summary>The SHA-256 of a file's bytes, the identity an imported file is traced by.</summary>
public static class FileHash
{
    /// <summary>Lower-case hex SHA-256 of the file at <paramref name="path"/>.</summary>
    public static string Sha256(string path)
    {
        using var stream = File.OpenRead(path);
        return Convert.ToHexStringLower(SHA256.HashData(stream));
    }
}
