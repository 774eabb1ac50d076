using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Envelopes;

/// <summary>One row of a lab-entered curve table.</summary>
/// <param name="Multiple">Current as a multiple of the device's rated current.</param>
/// <param name="Minimum">Earliest allowed trip; zero when it may trip at once.</param>
/// <param name="Maximum">Latest allowed trip; null when no trip is required.</param>
public sealed record CurveTablePoint(CurrentMultiple Multiple, Seconds Minimum, Seconds? Maximum);
