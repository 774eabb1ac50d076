using TripTestLog.Domain.Envelopes;

namespace TripTestLog.Domain.Verdicts;

/// <summary>A result outside a typical (drawn) edge but inside every guaranteed one: worth a look, never a failure.</summary>
/// <param name="Side">Which edge: earlier than the typical minimum, or later than the typical maximum.</param>
/// <param name="Edge">The typical edge.</param>
/// <param name="Message">Plain words a technician can act on.</param>
public sealed record Advisory(BandSide Side, BandEdge Edge, string Message);
