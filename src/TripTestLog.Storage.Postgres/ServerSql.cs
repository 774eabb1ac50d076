namespace TripTestLog.Storage.Postgres;

/// <summary>The SQL pieces the server store shares: the tag key, and the register columns in the server's types.</summary>
internal static class ServerSql
{
    /// <summary>
    /// One device whatever the case of A to Z (AssetTag's rule): the tag folded on those letters only, as SQLite's NOCASE
    /// does. An expression index on devices serves it.
    /// </summary>
    public static string TagKey(string expression) => $"translate({expression}, 'ABCDEFGHIJKLMNOPQRSTUVWXYZ', 'abcdefghijklmnopqrstuvwxyz')";

    /// <summary>The register columns of <paramref name="alias"/> as the shared reader reads them: dates and settings as text.</summary>
    public static string RegisterSelect(string alias) => string.Join(", ", DeviceMapping.Columns.Split(", ").Select(c => c switch
    {
        "commissioned_on" or "settings_from" => $"to_char({alias}.{c}, 'YYYY-MM-DD')",
        "settings_json" => $"{alias}.{c}::text",
        _ => $"{alias}.{c}",
    }));

    /// <summary>The register values as parameters, cast to the server's column types.</summary>
    public static string RegisterValues { get; } = string.Join(", ", DeviceMapping.Parameters.Select(p => p switch
    {
        "commissioned" or "from" => $"CAST(@{p} AS date)",
        "settings" => $"CAST(@{p} AS jsonb)",
        _ => "@" + p,
    }));
}
