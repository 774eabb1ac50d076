namespace TripTestLog.Storage.Entities;

/// <summary>A device as the newest register import describes it.</summary>
internal sealed class DeviceRow
{
    public long Id { get; set; }

    public string AssetTag { get; set; } = "";

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
}
