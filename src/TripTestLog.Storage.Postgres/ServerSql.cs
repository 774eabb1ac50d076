using Npgsql;
using NpgsqlTypes;
using TripTestLog.Domain.Devices;

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
    public static string RegisterValues { get; } = string.Join(", ", DeviceMapping.Parameters.Split(", ").Select(p => p switch
    {
        "$commissioned" or "$from" => $"CAST(@{p[1..]} AS date)",
        "$settings" => $"CAST(@{p[1..]} AS jsonb)",
        _ => "@" + p[1..],
    }));

    /// <summary>Binds a device's register values (and tag, source file and line) to <paramref name="command"/>.</summary>
    public static void Bind(NpgsqlCommand command, Device device, long sourceId, long line)
    {
        Set(command, "tag", device.Tag.Value);
        foreach (var (name, value) in DeviceMapping.Values(device))
        {
            Set(command, name[1..], value);
        }

        Set(command, "source", sourceId);
        Set(command, "line", line);
    }

    /// <summary>Sets a parameter, adding it on first use; a null is sent typed as the value's column would be.</summary>
    public static void Set(NpgsqlCommand command, string name, object? value)
    {
        if (!command.Parameters.Contains(name))
        {
            command.Parameters.Add(new NpgsqlParameter(name, TypeOf(name, value)));
        }

        command.Parameters[name].Value = value ?? DBNull.Value;
    }

    private static NpgsqlDbType TypeOf(string name, object? value) => value switch
    {
        DateTimeOffset => NpgsqlDbType.TimestampTz,
        DateOnly => NpgsqlDbType.Date,
        byte[] => NpgsqlDbType.Bytea,
        string => NpgsqlDbType.Text,
        double => NpgsqlDbType.Double,
        int => NpgsqlDbType.Integer,
        long => NpgsqlDbType.Bigint,
        bool => NpgsqlDbType.Boolean,
        _ => name is "limit" or "refamb" ? NpgsqlDbType.Double : NpgsqlDbType.Text,
    };
}
