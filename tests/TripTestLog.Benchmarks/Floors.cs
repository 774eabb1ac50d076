using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using System.Text.Json;
using Microsoft.Data.Sqlite;

namespace TripTestLog.Benchmarks;

/// <summary>
/// What SQLite itself can do with the same rows, measured on this machine in the same run: the yardsticks the
/// project's import and check are stated against.
/// </summary>
internal static class Floors
{
    /// <summary>
    /// Reads each trip file's lines and inserts them raw: one prepared command, one transaction per file, WAL,
    /// synchronous=NORMAL, a large cache, and a 16-byte SHA-256 content key with a unique index.
    /// </summary>
    public static long Insert(string db, IReadOnlyList<string> files)
    {
        foreach (var stale in new[] { db, db + "-wal", db + "-shm" })
        {
            File.Delete(stale);
        }

        using var connection = new SqliteConnection($"Data Source={db};Pooling=False");
        connection.Open();
        Execute(connection, "PRAGMA journal_mode=WAL; PRAGMA synchronous=NORMAL; PRAGMA cache_size=-200000; PRAGMA temp_store=MEMORY;");
        Execute(connection, "CREATE TABLE trips (id INTEGER PRIMARY KEY, asset_tag TEXT, tested_at TEXT, stage TEXT, pole TEXT, current_a REAL, "
            + "time_s REAL, start TEXT, ambient_c REAL, instrument TEXT, technician TEXT, note TEXT, content_key BLOB NOT NULL UNIQUE)");
        long rows = 0;
        foreach (var file in files)
        {
            using var transaction = connection.BeginTransaction();
            using var insert = connection.CreateCommand();
            insert.Transaction = transaction;
            insert.CommandText = "INSERT OR IGNORE INTO trips (asset_tag, tested_at, stage, pole, current_a, time_s, start, ambient_c, instrument, technician, note, content_key) "
                + "VALUES ($a, $b, $c, $d, $e, $f, $g, $h, $i, $j, $k, $key)";
            var p = new[] { "$a", "$b", "$c", "$d", "$e", "$f", "$g", "$h", "$i", "$j", "$k", "$key" }.Select(n => insert.Parameters.Add(n, SqliteType.Text)).ToArray();
            insert.Prepare();
            foreach (var line in File.ReadLines(file).Skip(1))
            {
                var f = line.Split(',');
                p[0].Value = f[0];
                p[1].Value = f[1];
                p[2].Value = f[2];
                p[3].Value = f[3];
                p[4].Value = double.Parse(f[4], CultureInfo.InvariantCulture);
                p[5].Value = double.Parse(f[5], CultureInfo.InvariantCulture);
                p[6].Value = f[7];
                p[7].Value = double.Parse(f[8], CultureInfo.InvariantCulture);
                p[8].Value = f[9];
                p[9].Value = f[10];
                p[10].Value = f[11];
                p[11].Value = SHA256.HashData(Encoding.UTF8.GetBytes(line)).AsSpan(0, 16).ToArray();
                rows += insert.ExecuteNonQuery();
            }

            transaction.Commit();
        }

        return rows;
    }

    /// <summary>
    /// A diagnostic, not a floor of the targets: the same raw insert into the project's own trip table (its columns,
    /// indexes and a hex fingerprint), to tell what the table costs from what the import's code costs.
    /// </summary>
    public static long InsertIntoProjectSchema(string db, IReadOnlyList<string> files)
    {
        using var connection = new SqliteConnection($"Data Source={db};Pooling=False");
        connection.Open();
        Execute(connection, "PRAGMA journal_mode=WAL; PRAGMA synchronous=NORMAL; PRAGMA cache_size=-262144; PRAGMA temp_store=MEMORY;");
        Execute(connection, "INSERT INTO source_files (file_name, sha256, kind, rows_read, records_added, duplicates, imported_at) VALUES ('x', 'x', 'trip-tests', 0, 0, 0, '2026-12-02T00:00:00Z')");
        var ids = new Dictionary<string, long>(StringComparer.Ordinal);
        using (var select = connection.CreateCommand())
        {
            select.CommandText = "SELECT asset_tag, id FROM devices";
            using var reader = select.ExecuteReader();
            while (reader.Read())
            {
                ids[reader.GetString(0)] = reader.GetInt64(1);
            }
        }

        long rows = 0;
        foreach (var file in files)
        {
            using var transaction = connection.BeginTransaction();
            using var insert = connection.CreateCommand();
            insert.Transaction = transaction;
            insert.CommandText = "INSERT OR IGNORE INTO trip_tests (device_id, tested_at, stage, pole, current_a, tripped, time_s, start, ambient_c, instrument, technician, note, "
                + "source_file_id, source_line, fingerprint) VALUES ($a, $b, $c, $d, $e, 1, $f, $g, $h, $i, $j, $k, (SELECT MAX(id) FROM source_files), $line, $key)";
            var p = new[] { "$a", "$b", "$c", "$d", "$e", "$f", "$g", "$h", "$i", "$j", "$k", "$line", "$key" }.Select(n => insert.Parameters.Add(n, SqliteType.Text)).ToArray();
            insert.Prepare();
            long lineNo = 1;
            foreach (var line in File.ReadLines(file).Skip(1))
            {
                var f = line.Split(',');
                p[0].Value = ids[f[0]];
                p[1].Value = f[1] + ":00";
                p[2].Value = f[2];
                p[3].Value = f[3];
                p[4].Value = double.Parse(f[4], CultureInfo.InvariantCulture);
                p[5].Value = double.Parse(f[5], CultureInfo.InvariantCulture);
                p[6].Value = f[7];
                p[7].Value = double.Parse(f[8], CultureInfo.InvariantCulture);
                p[8].Value = f[9];
                p[9].Value = f[10];
                p[10].Value = f[11];
                p[11].Value = ++lineNo;
                p[12].Value = Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(line)).AsSpan(0, 16));
                rows += insert.ExecuteNonQuery();
            }

            transaction.Commit();
        }

        return rows;
    }

    /// <summary>Reads the project's stored trip rows back in device and time order and writes each as a JSON line.</summary>
    public static long ReadAsJson(string db, string output)
    {
        using var connection = new SqliteConnection($"Data Source={db};Pooling=False;Mode=ReadOnly");
        connection.Open();
        using var select = connection.CreateCommand();
        select.CommandText = "SELECT d.asset_tag, t.tested_at, t.stage, t.pole, t.current_a, t.tripped, t.time_s, t.start, t.ambient_c, t.instrument, t.technician, t.note "
            + "FROM devices d CROSS JOIN trip_tests t ON t.device_id = d.id ORDER BY d.asset_tag, t.tested_at, t.source_file_id, t.source_line";
        using var reader = select.ExecuteReader();
        return WriteJsonLines(reader, output, r => r.GetString(1));
    }

    /// <summary>Writes each row of a read floor's query (tag, time, stage, pole, current, tripped, time, start, ambient, instrument, technician, note) as a JSON line.</summary>
    public static long WriteJsonLines(System.Data.Common.DbDataReader reader, string output, Func<System.Data.Common.DbDataReader, string> testedAt)
    {
        using var stream = new FileStream(output, FileMode.Create, FileAccess.Write, FileShare.None, 1 << 16);
        using var json = new Utf8JsonWriter(stream);
        var newline = "\n"u8.ToArray();
        long rows = 0;
        while (reader.Read())
        {
            json.WriteStartObject();
            json.WriteString("asset_tag", reader.GetString(0));
            json.WriteString("tested_at", testedAt(reader));
            json.WriteString("stage", reader.GetString(2));
            json.WriteString("pole", reader.GetString(3));
            json.WriteNumber("current_a", reader.GetDouble(4));
            json.WriteBoolean("tripped", reader.GetBoolean(5));
            json.WriteNumber("time_s", reader.GetDouble(6));
            json.WriteString("start", reader.GetString(7));
            if (reader.IsDBNull(8))
            {
                json.WriteNull("ambient_c");
            }
            else
            {
                json.WriteNumber("ambient_c", reader.GetDouble(8));
            }

            json.WriteString("instrument", reader.GetString(9));
            json.WriteString("technician", reader.GetString(10));
            json.WriteString("note", reader.GetString(11));
            json.WriteEndObject();
            json.Flush();
            stream.Write(newline);
            json.Reset();
            rows++;
        }

        return rows;
    }

    private static void Execute(SqliteConnection connection, string sql, SqliteTransaction? transaction = null)
    {
        using var command = connection.CreateCommand();
        command.Transaction = transaction;
        command.CommandText = sql;
        command.ExecuteNonQuery();
    }
}
