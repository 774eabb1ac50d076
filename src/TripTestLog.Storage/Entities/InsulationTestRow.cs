namespace TripTestLog.Storage.Entities;

/// <summary>A stored insulation resistance reading.</summary>
internal sealed class InsulationTestRow
{
    public long Id { get; set; }

    public long DeviceId { get; set; }

    public string TestedAt { get; set; } = "";

    public string Stage { get; set; } = "";

    public string Path { get; set; } = "";

    public double TestVoltageV { get; set; }

    public double ResistanceMohm { get; set; }

    /// <summary>True when the reading was "more than" the instrument's range.</summary>
    public bool OverRange { get; set; }

    public double? TemperatureC { get; set; }

    public double? DurationS { get; set; }

    /// <summary>The insulation tester's identity; empty when the record names none.</summary>
    public string Instrument { get; set; } = "";

    public long SourceFileId { get; set; }

    public long SourceLine { get; set; }

    public string Fingerprint { get; set; } = "";
}
