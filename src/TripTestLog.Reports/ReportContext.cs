using TripTestLog.Application.Findings;
using TripTestLog.Domain.Instruments;

namespace TripTestLog.Reports;

/// <summary>What every page of one report names: where its data came from and under which policy, so a print can be traced.</summary>
/// <param name="DatabaseFile">The database the report was made from.</param>
/// <param name="ToolVersion">This tool's version.</param>
/// <param name="AsOf">The date findings were judged on.</param>
/// <param name="GeneratedAt">When the report was written.</param>
/// <param name="Policy">The lab policy in force.</param>
/// <param name="PolicyFrom">Where the policy came from.</param>
/// <param name="Instruments">The instrument register, for the sign-off block.</param>
public sealed record ReportContext(string DatabaseFile, string ToolVersion, DateOnly AsOf, DateTimeOffset GeneratedAt, FindingPolicy Policy,
    string PolicyFrom, InstrumentRegister Instruments)
{
    /// <summary>The footer line of every page.</summary>
    public string Footer => $"TripTestLog {ToolVersion}; database {DatabaseFile}; findings as of {AsOf:yyyy-MM-dd}; policy: {PolicyFrom}; "
        + $"written {GeneratedAt:yyyy-MM-dd HH:mm} UTC.";
}
