using TripTestLog.Application.Check;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Application.Tests;

/// <summary>Typed records for the rule tests, built as a register row and measurement rows would be read.</summary>
internal static class Records
{
    /// <summary>A 230 V, 1-pole IEC 60898-1 breaker of curve C and the rating given, commissioned 2019.</summary>
    public static Device Breaker(string tag, double ratedA = 16) =>
        new(AssetTag.Of(tag), "Site", "Way 1", DeviceFamily.Iec60898, Amperes.Of(ratedA), 1, Volts.Of(230), new DateOnly(2019, 1, 1), null, "", "", "",
            new Iec60898Settings(TripCurve.C));

    public static StoredMeasurement<InsulationMeasurement> Insulation(string tag, string date, string path, double megaOhms, double? celsius,
        bool overRange = false, int line = 2) =>
        new(new InsulationMeasurement(AssetTag.Of(tag), TestedAt.Parse(date), TestStage.AsFound, path, Volts.Of(500),
            new InsulationReading(MegaOhms.Of(megaOhms), overRange), celsius is { } c ? Celsius.Of(c) : null, Seconds.Of(60)), "insulation.csv", line);

    public static StoredTrip TrippedAfter(string tag, string at, double amperes, double seconds, double ambientC, int line = 2) =>
        new(AssetTag.Of(tag), new TripMeasurement(AssetTag.Of(tag), TestedAt.Parse(at), TestStage.AsFound, Pole.Parse("all"), Amperes.Of(amperes),
            TripOutcome.TrippedAfter(Seconds.Of(seconds)), StartCondition.Cold, Celsius.Of(ambientC), "", "", ""), "trips.csv", line);

    public static DeviceRecords Device(Device entry, IReadOnlyList<StoredTrip>? trips = null,
        IReadOnlyList<StoredMeasurement<InsulationMeasurement>>? insulation = null) =>
        new(new DeviceHistory([entry]), trips ?? []) { Insulation = insulation ?? [] };
}
