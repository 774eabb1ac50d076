namespace TripTestLog.Storage.Entities;

/// <summary>
/// One state of a device's register entry, kept every time an import changes it, so the settings and ratings in
/// force on any test date can be recovered.
/// </summary>
internal sealed class DeviceRevisionRow
{
    public long Id { get; set; }

    public long DeviceId { get; set; }

    public string Site { get; set; } = "";

    public string Location { get; set; } = "";

    public string Family { get; set; } = "";

    public string Curve { get; set; } = "";

    public double RatedCurrentA { get; set; }

    public int Poles { get; set; }

    public double RatedVoltageV { get; set; }

    public string? CommissionedOn { get; set; }

    public double? ContactLimitUohm { get; set; }

    public string Make { get; set; } = "";

    public string Model { get; set; } = "";

    public string Serial { get; set; } = "";

    /// <summary>The family's settings as JSON (see SettingsCodec).</summary>
    public string SettingsJson { get; set; } = "";

    public string? SettingsFrom { get; set; }

    public string? CurveTable { get; set; }

    public double? ReferenceAmbientC { get; set; }

    public string? AmbientTable { get; set; }

    /// <summary>1 (highest) to 3; 2 when the register gives none.</summary>
    public int Criticality { get; set; } = 2;

    public long SourceFileId { get; set; }

    public long SourceLine { get; set; }

    /// <summary>UTC, ISO 8601: when this state was imported.</summary>
    public string RecordedAt { get; set; } = "";
}
