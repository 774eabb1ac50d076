using System.Data.Common;
using TripTestLog.Domain.Instruments;

namespace TripTestLog.Storage;

/// <summary>The instrument register's accuracy columns, written and read the same way by every store.</summary>
internal static class InstrumentAccuracyColumns
{
    /// <summary>The column names, in order.</summary>
    public static readonly string[] Names =
    [
        "time_accuracy_pct", "time_accuracy_s", "current_accuracy_pct", "current_accuracy_a", "resistance_accuracy_pct", "resistance_accuracy_uohm",
        "insulation_accuracy_pct", "coverage_factor",
    ];

    /// <summary>The names joined for a column list.</summary>
    public static string List => string.Join(", ", Names);

    /// <summary>The figures of <paramref name="a"/> in column order; a figure not stated is <see cref="DBNull"/>.</summary>
    public static object[] Values(InstrumentAccuracy a) =>
    [
        Db(a.TimePercent), Db(a.TimeSeconds), Db(a.CurrentPercent), Db(a.CurrentAmperes), Db(a.ResistancePercent), Db(a.ResistanceMicroOhms),
        Db(a.InsulationPercent), Db(a.CoverageFactor),
    ];

    /// <summary>The accuracy in the columns of <paramref name="r"/> from <paramref name="first"/> on.</summary>
    public static InstrumentAccuracy Read(DbDataReader r, int first)
    {
        double? At(int i) => r.IsDBNull(first + i) ? null : r.GetDouble(first + i);
        return InstrumentAccuracy.Of(At(0), At(1), At(2), At(3), At(4), At(5), At(6), At(7));
    }

    /// <summary>The fingerprint parts of a stated accuracy; none when nothing is stated, so older rows keep their fingerprints.</summary>
    public static string[] FingerprintParts(InstrumentAccuracy a) => a.IsEmpty ? [] :
        [.. Values(a).Select(v => v is double d ? d.ToString("R", System.Globalization.CultureInfo.InvariantCulture) : "")];

    private static object Db(double? value) => value is { } v ? v : DBNull.Value;
}
