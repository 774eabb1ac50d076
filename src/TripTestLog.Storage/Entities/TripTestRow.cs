namespace TripTestLog.Storage.Entities;

/// <summary>A stored trip test.</summary>
internal sealed class TripTestRow
{
    public long Id { get; set; }

    public long DeviceId { get; set; }

    /// <summary>ISO 8601 as written (sortable: local date-time first).</summary>
    public string TestedAt { get; set; } = "";

    public string Stage { get; set; } = "";

    public string Pole { get; set; } = "";

    public double CurrentA { get; set; }

    public bool Tripped { get; set; }

    /// <summary>The trip time when tripped, the hold time when not.</summary>
    public double TimeS { get; set; }

    public string Start { get; set; } = "";

    public double? AmbientC { get; set; }

    public string Instrument { get; set; } = "";

    public string Technician { get; set; } = "";

    public string Note { get; set; } = "";

    // Settings read off the device at the test, when the record gave them.
    public double? FoundIrA { get; set; }

    public double? FoundIsdA { get; set; }

    public double? FoundIiA { get; set; }

    public double? FoundImA { get; set; }

    public double? FoundPickupA { get; set; }

    public double? FoundTms { get; set; }

    public long SourceFileId { get; set; }

    public long SourceLine { get; set; }

    /// <summary>Hash of the record's content: the same measurement imported twice is stored once.</summary>
    public string Fingerprint { get; set; } = "";
}
