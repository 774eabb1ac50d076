using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Planning;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Application.Worksheet;

/// <summary>Everything a technician needs before testing one device: what to inject or apply, in which order, and what passes.</summary>
/// <param name="Device">The register entry in force on the worksheet's date.</param>
/// <param name="Stage">The stage the tests will be recorded as.</param>
/// <param name="Envelope">The envelope the trip windows come from, the one the check uses.</param>
/// <param name="Trips">The trip tests, in order.</param>
/// <param name="Contacts">A contact resistance test per pole.</param>
/// <param name="Insulation">An insulation resistance test per path.</param>
public sealed record DeviceWorksheet(Device Device, TestStage Stage, ITripEnvelope Envelope, IReadOnlyList<PlannedTrip> Trips,
    IReadOnlyList<PlannedContact> Contacts, IReadOnlyList<PlannedInsulation> Insulation)
{
    /// <summary>Why the device has no trip tests on the sheet, when it has none.</summary>
    public string? NoTrips => Trips.Count > 0 ? null
        : Envelope is UnavailableEnvelope u ? u.Reason : "the device's standard and settings give no test point";

    /// <summary>The label of planned row <paramref name="index"/> of a section: T1, C1, I1 and so on. The CSVs carry the same labels.</summary>
    public static string RowLabel(char section, int index) => $"{section}{index + 1}";
}

/// <summary>A contact (micro-ohm) resistance test on one pole.</summary>
/// <param name="Pole">The pole, 1 to 4.</param>
/// <param name="TestCurrent">The DC test current the lab policy advises for the device's rating.</param>
/// <param name="Limit">The highest acceptable reading, from the maker's data in the register; null when none is known.</param>
/// <param name="Basis">Where the test current and limit come from.</param>
public sealed record PlannedContact(Pole Pole, Amperes TestCurrent, MicroOhms? Limit, string Basis);

/// <summary>An insulation resistance test on one path.</summary>
/// <param name="Path">The path, e.g. 1-E (pole to earth), 1-1' (across the open contacts), 1-2 (between poles).</param>
/// <param name="TestVoltage">The DC test voltage from the policy's table; null when the table has no row for the rated voltage.</param>
/// <param name="Minimum">The lowest acceptable reading from the same row; null likewise.</param>
/// <param name="Basis">The table and row.</param>
public sealed record PlannedInsulation(string Path, Volts? TestVoltage, MegaOhms? Minimum, string Basis)
{
    /// <summary>The usual duration of an insulation reading (common practice: one minute).</summary>
    public static Seconds Duration => Seconds.Of(60);
}
