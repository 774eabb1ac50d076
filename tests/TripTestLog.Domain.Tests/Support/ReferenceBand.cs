using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Domain.Tests.Support;

/// <summary>
/// Reads a band's guaranteed edges for a test at the standards' reference conditions (from cold, all poles loaded),
/// the conditions the published tables are stated for. Tests of other conditions call <see cref="TripBand.For"/>.
/// </summary>
internal static class ReferenceBand
{
    extension(TripBand band)
    {
        public BandEdge Minimum => band.For(TestConditions.Reference).Minimum;

        public BandEdge Maximum => band.For(TestConditions.Reference).Maximum;
    }
}
