using TripTestLog.Application.Findings;

namespace TripTestLog.Cli.Output;

/// <summary>Writes findings as they are produced, one device at a time.</summary>
internal interface IFindingWriter
{
    /// <summary>Writes <paramref name="findings"/> of <paramref name="device"/> (already filtered).</summary>
    void Add(DeviceCondition device, IReadOnlyList<Finding> findings);

    /// <summary>Ends the output.</summary>
    void Finish();
}
