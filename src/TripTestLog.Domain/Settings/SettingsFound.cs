using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Settings;

/// <summary>
/// Settings read off the device at the test (as-found), carried on a trip record. They win over the register for that
/// test, because they are what was in force when it was made; where they differ from the register, the verdict says so.
/// </summary>
/// <param name="Ir">Long-time or thermal setting.</param>
/// <param name="Isd">Short-time pickup.</param>
/// <param name="Ii">Instantaneous pickup.</param>
/// <param name="Im">Magnetic setting.</param>
/// <param name="Pickup">Relay pickup.</param>
/// <param name="Tms">Relay time multiplier.</param>
public sealed record SettingsFound(Amperes? Ir, Amperes? Isd, Amperes? Ii, Amperes? Im, Amperes? Pickup, double? Tms)
{
    /// <summary>Whether the record carried any setting.</summary>
    public bool IsEmpty => this == new SettingsFound(null, null, null, null, null, null);

    /// <summary>The register's settings with these applied, and one note per setting that differs or does not apply.</summary>
    public (DeviceSettings Settings, IReadOnlyList<string> Notes) ApplyTo(DeviceSettings register)
    {
        var notes = new List<string>();
        DeviceSettings result = register switch
        {
            ElectronicTripSettings e => e with
            {
                Ir = Pick("Ir", e.Ir, Ir, notes),
                Isd = PickOptional("Isd", e.Isd, Isd, notes),
                Ii = PickOptional("Ii", e.Ii, Ii, notes),
            },
            ThermalMagneticSettings t => t with { Ir = Pick("Ir", t.Ir, Ir, notes), Im = Pick("Im", t.Im, Im, notes) },
            RelaySettings r => r with { Pickup = Pick("pickup", r.Pickup, Pickup, notes), Tms = PickTms(r.Tms, notes) },
            _ => register,
        };

        var unused = Unused(register);
        if (unused.Count > 0)
        {
            notes.Add($"settings {string.Join(", ", unused)} on the test record do not apply to this device and were ignored");
        }

        return (result, notes);
    }

    private double PickTms(double register, List<string> notes)
    {
        if (Tms is { } found && Math.Abs(found - register) > 1e-9)
        {
            notes.Add($"judged with TMS {found:0.###} found on the device; the register says {register:0.###}");
            return found;
        }

        return register;
    }

    private static Amperes Pick(string name, Amperes register, Amperes? found, List<string> notes)
    {
        if (found is { } f && f != register)
        {
            notes.Add($"judged with {name} {f} found on the device; the register says {register}");
            return f;
        }

        return register;
    }

    private static Amperes? PickOptional(string name, Amperes? register, Amperes? found, List<string> notes)
    {
        if (found is { } f && f != register)
        {
            notes.Add($"judged with {name} {f} found on the device; the register says {(register is { } r ? r.ToString() : "none")}");
            return f;
        }

        return register;
    }

    private List<string> Unused(DeviceSettings register)
    {
        var given = new List<(string Name, bool Given, bool Applies)>
        {
            ("ir_a", Ir is not null, register is ElectronicTripSettings or ThermalMagneticSettings),
            ("isd_a", Isd is not null, register is ElectronicTripSettings),
            ("ii_a", Ii is not null, register is ElectronicTripSettings),
            ("im_a", Im is not null, register is ThermalMagneticSettings),
            ("pickup_a", Pickup is not null, register is RelaySettings),
            ("tms", Tms is not null, register is RelaySettings),
        };
        return given.Where(g => g.Given && !g.Applies).Select(g => g.Name).ToList();
    }
}
