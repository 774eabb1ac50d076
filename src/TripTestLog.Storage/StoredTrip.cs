using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Storage;

/// <summary>A stored trip test with its device and where it was imported from.</summary>
/// <param name="Device">The device as the register now describes it.</param>
/// <param name="Measurement">The test.</param>
/// <param name="SourceFile">The file it was imported from.</param>
/// <param name="SourceLine">The line of that file.</param>
public sealed record StoredTrip(Device Device, TripMeasurement Measurement, string SourceFile, long SourceLine);
