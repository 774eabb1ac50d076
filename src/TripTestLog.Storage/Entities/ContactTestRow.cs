namespace TripTestLog.Storage.Entities;

/// <summary>A stored contact resistance reading.</summary>
internal sealed class ContactTestRow
{
    public long Id { get; set; }

    public long DeviceId { get; set; }

    public string TestedAt { get; set; } = "";

    public string Stage { get; set; } = "";

    public string Pole { get; set; } = "";

    public double ResistanceUohm { get; set; }

    public double TestCurrentA { get; set; }

    public double? TemperatureC { get; set; }

    public string Instrument { get; set; } = "";

    public string Technician { get; set; } = "";

    public long SourceFileId { get; set; }

    public long SourceLine { get; set; }

    public string Fingerprint { get; set; } = "";
}
