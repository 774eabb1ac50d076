using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Application.Findings;

/// <summary>A later test that changed a finding's standing: an as-found test that closed it, or an as-left test that confirms a repair.</summary>
/// <param name="Closes">True for an as-found test that closed it; false for an as-left test that confirms a repair.</param>
/// <param name="On">The test's date.</param>
/// <param name="By">What the test showed.</param>
public sealed record Settlement(bool Closes, DateOnly On, Settler By);

/// <summary>What a later test showed that settled a finding, as values: a closed set, worded at the edge.</summary>
public abstract record Settler
{
    private Settler()
    {
    }

    /// <summary>A decided verdict at a trip test point.</summary>
    /// <param name="Verdict">The verdict.</param>
    /// <param name="Point">The test point.</param>
    /// <param name="ClearOfUncertainty">Whether it is the verdict's distance from the measurement uncertainty that settled it.</param>
    public sealed record TripVerdict(Verdict Verdict, string Point, bool ClearOfUncertainty = false) : Settler;

    /// <summary>A test that read the register's settings on the device.</summary>
    public sealed record RegisterSettings : Settler;

    /// <summary>A test made with an instrument traceable on the day.</summary>
    /// <param name="Tests">The kind of test.</param>
    public sealed record TraceableInstrument(TestKind Tests) : Settler;

    /// <summary>A pole's reading within the maker's limit.</summary>
    /// <param name="Pole">The pole.</param>
    /// <param name="MicroOhms">Its reading at 20 °C.</param>
    public sealed record PoleWithinLimit(string Pole, double MicroOhms) : Settler;

    /// <summary>A pole's reading within the policy's spread.</summary>
    /// <param name="Pole">The pole.</param>
    public sealed record PoleWithinSpread(string Pole) : Settler;

    /// <summary>A pole's reading near its first as-found reading.</summary>
    /// <param name="Pole">The pole.</param>
    public sealed record PoleNearBaseline(string Pole) : Settler;

    /// <summary>A contact test at the usual test current.</summary>
    public sealed record AdequateTestCurrent : Settler;

    /// <summary>A path's reading above the table's minimum.</summary>
    /// <param name="Path">The path.</param>
    public sealed record PathAboveMinimum(string Path) : Settler;

    /// <summary>A path tested at the table's voltage.</summary>
    /// <param name="Path">The path.</param>
    /// <param name="Volts">The test voltage, DC.</param>
    public sealed record PathAtVoltage(string Path, double Volts) : Settler;

    /// <summary>A resistance reading clear of the measurement uncertainty of its limit.</summary>
    public sealed record ReadingClearOfUncertainty : Settler;
}
