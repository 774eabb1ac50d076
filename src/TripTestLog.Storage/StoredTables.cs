using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;
using TripTestLog.Storage.Entities;

namespace TripTestLog.Storage;

/// <summary>Curve and ambient tables from their stored rows, for every store: the newest file that holds a table's name defines it.</summary>
internal static class StoredTables
{
    public static IReadOnlyDictionary<string, CurveTable> Curves(IEnumerable<CurveTableRowEntity> rows)
    {
        return rows.GroupBy(r => r.TableName, StringComparer.Ordinal).ToDictionary(
            g => g.Key,
            g =>
            {
                var newest = g.Max(r => r.SourceFileId);
                return CurveTable.Create(g.Key, g.Where(r => r.SourceFileId == newest).OrderBy(r => r.SourceLine)
                    .Select(r => new CurveTablePoint(CurrentMultiple.Of(r.Multiple), Seconds.Of(r.MinS), r.MaxS is { } m ? Seconds.Of(m) : null)).ToList());
            },
            StringComparer.Ordinal);
    }

    public static IReadOnlyDictionary<string, AmbientTable> Ambients(IEnumerable<AmbientTableRowEntity> rows)
    {
        return rows.GroupBy(r => r.TableName, StringComparer.Ordinal).ToDictionary(
            g => g.Key,
            g =>
            {
                var newest = g.Max(r => r.SourceFileId);
                return AmbientTable.Create(g.Key, g.Where(r => r.SourceFileId == newest).OrderBy(r => r.SourceLine)
                    .Select(r => new AmbientPoint(Celsius.Of(r.AmbientC), r.CurrentFactor)).ToList());
            },
            StringComparer.Ordinal);
    }
}
