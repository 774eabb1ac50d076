using TripTestLog.Domain.Measurements;

namespace TripTestLog.Application.Check;

/// <summary>A stored contact or insulation measurement and where it was imported from.</summary>
/// <typeparam name="T">The measurement type.</typeparam>
/// <param name="Measurement">The measurement.</param>
/// <param name="SourceFile">The file it was imported from.</param>
/// <param name="SourceLine">The line of that file.</param>
public sealed record StoredMeasurement<T>(T Measurement, string SourceFile, long SourceLine) where T : IMeasurement;
