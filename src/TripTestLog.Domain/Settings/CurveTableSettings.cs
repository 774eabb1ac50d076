namespace TripTestLog.Domain.Settings;

/// <summary>A device judged only by a band the lab entered from the maker's published curve.</summary>
/// <param name="Table">The curve table's name; its multiples are of the device's rated current.</param>
public sealed record CurveTableSettings(string Table) : DeviceSettings
{
    /// <inheritdoc />
    public override string Summary => $"curve table {Table}";
}
