using TripTestLog.Application.Import;
using TripTestLog.Application.Check;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Application.Check;

/// <summary>A stored trip test and where it was imported from.</summary>
/// <param name="Tag">The device tested.</param>
/// <param name="Measurement">The test.</param>
/// <param name="SourceFile">The file it was imported from.</param>
/// <param name="SourceLine">The line of that file.</param>
public sealed record StoredTrip(AssetTag Tag, TripMeasurement Measurement, string SourceFile, long SourceLine);
