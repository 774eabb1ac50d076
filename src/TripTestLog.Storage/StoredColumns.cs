namespace TripTestLog.Storage;

/// <summary>
/// The columns every store's measurement queries select, in the order <see cref="StoredRows"/> reads them: the device's
/// asset tag (alias d) first, the test time second, the source file and line after the values. Tables are aliased t
/// (trips), c (contact) and i (insulation).
/// </summary>
internal static class StoredColumns
{
    public const string Trips =
        "d.asset_tag, t.tested_at, t.stage, t.pole, t.current_a, t.tripped, t.time_s, t.start, t.ambient_c, t.instrument, t.technician, t.note, "
        + "t.source_file_id, t.source_line, t.found_ir_a, t.found_isd_a, t.found_ii_a, t.found_im_a, t.found_pickup_a, t.found_tms";

    public const string Contacts =
        "d.asset_tag, c.tested_at, c.stage, c.pole, c.resistance_uohm, c.test_current_a, c.temperature_c, c.instrument, c.technician, c.source_file_id, c.source_line";

    public const string Insulation =
        "d.asset_tag, i.tested_at, i.stage, i.path, i.test_voltage_v, i.resistance_mohm, i.over_range, i.temperature_c, i.duration_s, i.source_file_id, i.source_line, i.instrument";

    /// <summary>The alias and columns of the table a measurement kind is stored in.</summary>
    public static (string Alias, string Columns) Of(MeasurementTable table) => table.Table switch
    {
        "trip_tests" => ("t", Trips),
        "contact_tests" => ("c", Contacts),
        _ => ("i", Insulation),
    };
}
