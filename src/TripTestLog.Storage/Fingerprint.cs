using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using TripTestLog.Domain.Instruments;

namespace TripTestLog.Storage;

/// <summary>
/// A content hash of a record over its values exactly as stored: the table name, then every value column as text
/// (stored codes such as "as-found" and "cold", never enum member names; doubles in round-trip form). Two rows with the
/// same fingerprint are the same record, whichever file they came in, and a stored row can be re-hashed from its
/// columns alone (<see cref="FingerprintScheme"/>).
/// </summary>
internal static class Fingerprint
{
    /// <summary>The fingerprint of a measurement row of <paramref name="table"/> with <paramref name="values"/> in column order.</summary>
    public static string Of(MeasurementTable table, IReadOnlyList<object> values)
    {
        var parts = new string[values.Count + 1];
        parts[0] = table.Table;
        for (var i = 0; i < values.Count; i++)
        {
            parts[i + 1] = MeasurementTable.Text(values[i]);
        }

        return Hash(parts);
    }

    public static string Of(InstrumentCalibration c) => Hash("instrument", c.Instrument, c.Kind, c.Serial,
        c.CalibratedOn.ToString(CultureInfo.InvariantCulture), c.CalibrationDue.ToString(CultureInfo.InvariantCulture));

    private static string Hash(params string[] parts) =>
        Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(string.Join('\u001f', parts))))[..32];
}
