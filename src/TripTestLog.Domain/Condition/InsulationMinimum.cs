using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Condition;

/// <summary>The lowest acceptable insulation resistance for a class of rated voltage, with the test voltage it assumes.</summary>
/// <param name="UpToRatedVoltage">The highest rated voltage the row covers.</param>
/// <param name="TestVoltage">The DC test voltage the row prescribes.</param>
/// <param name="Minimum">The lowest acceptable reading.</param>
/// <param name="Source">The table and row, in words.</param>
public sealed record InsulationMinimum(Volts UpToRatedVoltage, Volts TestVoltage, MegaOhms Minimum, string Source)
{
    // ANSI/NETA maintenance testing specifications, the table of insulation resistance test values for electrical
    // apparatus other than rotating machinery; these three rows are quoted from memory and were not checked against the text.
    private static readonly InsulationMinimum[] Neta =
    [
        new(Volts.Of(250), Volts.Of(500), MegaOhms.Of(25), "ANSI/NETA maintenance table, rated up to 250 V: 500 V DC, 25 MΩ (from memory)"),
        new(Volts.Of(600), Volts.Of(1000), MegaOhms.Of(100), "ANSI/NETA maintenance table, rated up to 600 V: 1000 V DC, 100 MΩ (from memory)"),
        new(Volts.Of(1000), Volts.Of(1000), MegaOhms.Of(100), "ANSI/NETA maintenance table, rated up to 1000 V: 1000 V DC, 100 MΩ (from memory)"),
    ];

    // IEC 60364-6 Table 6.1 (2016 edition, from memory; a secondary source quotes the same rows): SELV and PELV 250 V DC,
    // 0.5 MOhm; up to and including 500 V, 500 V DC, 1 MOhm; above 500 V, 1000 V DC, 1 MOhm.
    private static readonly InsulationMinimum[] Iec60364 =
    [
        new(Volts.Of(50), Volts.Of(250), MegaOhms.Of(0.5), "IEC 60364-6 Table 6.1, SELV and PELV: 250 V DC, 0.5 MΩ"),
        new(Volts.Of(500), Volts.Of(500), MegaOhms.Of(1), "IEC 60364-6 Table 6.1, up to 500 V: 500 V DC, 1 MΩ"),
        new(Volts.Of(1000), Volts.Of(1000), MegaOhms.Of(1), "IEC 60364-6 Table 6.1, above 500 V: 1000 V DC, 1 MΩ"),
    ];

    /// <summary>The row of <paramref name="table"/> that covers <paramref name="ratedVoltage"/>; null above the table (over 1000 V).</summary>
    public static InsulationMinimum? For(InsulationTable table, Volts ratedVoltage)
    {
        var rows = table == InsulationTable.NetaMaintenance ? Neta : Iec60364;
        return rows.FirstOrDefault(r => ratedVoltage.Value <= r.UpToRatedVoltage.Value);
    }
}
