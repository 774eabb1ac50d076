using System.Buffers;
using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using TripTestLog.Domain.Instruments;

namespace TripTestLog.Storage;

/// <summary>
/// A content hash of a record over its values exactly as stored: the table name, then every value column as text
/// (stored codes such as "as-found" and "cold", never enum member names; doubles in round-trip form). Two rows with the
/// same fingerprint are the same record, whichever file they came in, and a stored row can be re-hashed from its
/// columns alone (the SQLite adapter re-hashes old rows when the scheme changes).
/// </summary>
internal static class Fingerprint
{
    /// <summary>The fingerprint of a measurement row of <paramref name="table"/> with <paramref name="values"/> in column order.</summary>
    public static string Of(MeasurementTable table, IReadOnlyList<object> values)
    {
        // Built in one pooled buffer rather than as joined strings: this runs once per imported row.
        var text = new StringBuilder(256).Append(table.Table);
        Span<char> number = stackalloc char[32];
        var hashed = values.Count;
        while (hashed > values.Count - table.UnhashedWhenEmpty && MeasurementTable.Text(values[hashed - 1]).Length == 0)
        {
            hashed--;
        }

        for (var i = 0; i < hashed; i++)
        {
            var value = values[i];
            text.Append('\u001f');
            if (value is double d && d.TryFormat(number, out var written, "R", CultureInfo.InvariantCulture))
            {
                text.Append(number[..written]);
            }
            else
            {
                text.Append(MeasurementTable.Text(value));
            }
        }

        var chars = text.Length;
        var bytes = ArrayPool<byte>.Shared.Rent(Encoding.UTF8.GetMaxByteCount(chars));
        try
        {
            var rented = ArrayPool<char>.Shared.Rent(chars);
            text.CopyTo(0, rented, chars);
            var length = Encoding.UTF8.GetBytes(rented, 0, chars, bytes, 0);
            ArrayPool<char>.Shared.Return(rented);
            Span<byte> hash = stackalloc byte[32];
            SHA256.HashData(bytes.AsSpan(0, length), hash);
            return Convert.ToHexStringLower(hash[..16]);
        }
        finally
        {
            ArrayPool<byte>.Shared.Return(bytes);
        }
    }

    public static string Of(InstrumentCalibration c) => Hash(["instrument", c.Instrument, c.Kind, c.Serial,
        c.CalibratedOn.ToString(CultureInfo.InvariantCulture), c.CalibrationDue.ToString(CultureInfo.InvariantCulture),
        .. InstrumentAccuracyColumns.FingerprintParts(c.Accuracy)]);

    private static string Hash(params string[] parts) =>
        Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(string.Join('\u001f', parts))))[..32];
}
