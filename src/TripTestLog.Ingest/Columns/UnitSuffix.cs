using TripTestLog.Application.Records;
namespace TripTestLog.Ingest.Columns;

/// <summary>The unit suffixes a column name may carry, and the factor to the unit the store keeps.</summary>
internal static class UnitSuffix
{
    private static readonly IReadOnlyDictionary<Quantity, IReadOnlyDictionary<string, double>> Factors =
        new Dictionary<Quantity, IReadOnlyDictionary<string, double>>
        {
            [Quantity.Current] = new Dictionary<string, double> { ["a"] = 1.0, ["ka"] = 1000.0 },
            [Quantity.Time] = new Dictionary<string, double> { ["s"] = 1.0, ["ms"] = 0.001 },

            // In a contact file "mohm" is milli-ohm; in an insulation file it is megohm. The kind decides.
            [Quantity.ContactResistance] = new Dictionary<string, double> { ["uohm"] = 1.0, ["mohm"] = 1000.0 },
            [Quantity.InsulationResistance] = new Dictionary<string, double> { ["mohm"] = 1.0, ["gohm"] = 1000.0 },
            [Quantity.Voltage] = new Dictionary<string, double> { ["v"] = 1.0, ["kv"] = 1000.0 },
            [Quantity.Temperature] = new Dictionary<string, double> { ["c"] = 1.0 },
        };

    /// <summary>The factor from <paramref name="suffix"/> to the stored unit, or null when the quantity does not take it.</summary>
    public static double? FactorFor(Quantity quantity, string suffix) =>
        Factors.TryGetValue(quantity, out var table) && table.TryGetValue(suffix, out var factor) ? factor : null;

    /// <summary>The suffixes a quantity accepts, e.g. "_s or _ms".</summary>
    public static string Accepted(Quantity quantity) =>
        Factors.TryGetValue(quantity, out var table) ? string.Join(" or ", table.Keys.Select(k => "_" + k)) : "none";

    /// <summary>Whether the quantity is written with a unit suffix.</summary>
    public static bool TakesSuffix(Quantity quantity) => Factors.ContainsKey(quantity);
}
