using Microsoft.Data.Sqlite;

namespace TripTestLog.Storage.Sqlite;

/// <summary>
/// Keeps stored fingerprints in the current scheme. Databases written before scheme 2 hashed enum member names; on
/// open their measurement fingerprints are recomputed from the stored columns, once, in one transaction, and the
/// scheme is recorded in SQLite's <c>user_version</c>.
/// </summary>
internal static class FingerprintScheme
{
    /// <summary>The scheme this version writes: 2, the stored values and codes.</summary>
    public const int Current = 2;

    public static void Upgrade(SqliteConnection connection)
    {
        using var version = connection.CreateCommand();
        version.CommandText = "PRAGMA user_version;";
        if (Convert.ToInt32(version.ExecuteScalar(), System.Globalization.CultureInfo.InvariantCulture) >= Current)
        {
            return;
        }

        using var transaction = connection.BeginTransaction(deferred: false);
        foreach (var table in new[] { MeasurementTable.Trips, MeasurementTable.Contacts, MeasurementTable.Insulations })
        {
            Rehash(connection, transaction, table);
        }

        using var mark = connection.CreateCommand();
        mark.Transaction = transaction;
        mark.CommandText = $"PRAGMA user_version = {Current};";
        mark.ExecuteNonQuery();
        transaction.Commit();
    }

    private static void Rehash(SqliteConnection connection, SqliteTransaction transaction, MeasurementTable table)
    {
        var updates = new List<(long Id, string Fingerprint)>();
        using (var select = connection.CreateCommand())
        {
            select.Transaction = transaction;
            select.CommandText = $"SELECT id, {string.Join(", ", table.Columns)} FROM {table.Table}";
            using var reader = select.ExecuteReader();
            var values = new object[table.Columns.Length];
            while (reader.Read())
            {
                for (var i = 0; i < values.Length; i++)
                {
                    values[i] = reader.GetValue(i + 1);
                }

                updates.Add((reader.GetInt64(0), Fingerprint.Of(table, values)));
            }
        }

        using var update = connection.CreateCommand();
        update.Transaction = transaction;
        update.CommandText = $"UPDATE {table.Table} SET fingerprint = $fp WHERE id = $id";
        var fp = update.Parameters.Add("$fp", SqliteType.Text);
        var id = update.Parameters.Add("$id", SqliteType.Integer);
        update.Prepare();
        foreach (var (rowId, print) in updates)
        {
            fp.Value = print;
            id.Value = rowId;
            update.ExecuteNonQuery();
        }
    }
}
