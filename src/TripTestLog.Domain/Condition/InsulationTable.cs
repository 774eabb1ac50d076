namespace TripTestLog.Domain.Condition;

/// <summary>Which published table of insulation minimums a lab judges by; the text codes are in the lab policy.</summary>
public enum InsulationTable
{
    /// <summary>The ANSI/NETA maintenance testing table: minimums by the equipment's rated voltage (the default).</summary>
    NetaMaintenance,

    /// <summary>IEC 60364-6 Table 6.1: the far lower minimums for a verified installation.</summary>
    Iec60364Installation,
}
