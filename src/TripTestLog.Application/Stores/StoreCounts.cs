namespace TripTestLog.Application.Stores;

/// <summary>How many of each thing the store holds.</summary>
/// <param name="Files">Imported files.</param>
/// <param name="Devices">Devices in the register.</param>
/// <param name="TripTests">Trip tests.</param>
/// <param name="ContactTests">Contact resistance readings.</param>
/// <param name="InsulationTests">Insulation resistance readings.</param>
public sealed record StoreCounts(long Files, long Devices, long TripTests, long ContactTests, long InsulationTests);
