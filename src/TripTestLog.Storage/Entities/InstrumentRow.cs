namespace TripTestLog.Storage.Entities;

/// <summary>One calibration period of a test instrument, from the instrument register.</summary>
internal sealed class InstrumentRow
{
    public long Id { get; set; }

    public string Instrument { get; set; } = "";

    public string Kind { get; set; } = "";

    public string Serial { get; set; } = "";

    public string CalibratedOn { get; set; } = "";

    public string CalibrationDue { get; set; } = "";

    public double? TimeAccuracyPct { get; set; }

    public double? TimeAccuracyS { get; set; }

    public double? CurrentAccuracyPct { get; set; }

    public double? CurrentAccuracyA { get; set; }

    public double? ResistanceAccuracyPct { get; set; }

    public double? ResistanceAccuracyUohm { get; set; }

    public double? InsulationAccuracyPct { get; set; }

    public double? CoverageFactor { get; set; }

    public long SourceFileId { get; set; }

    public long SourceLine { get; set; }

    public string Fingerprint { get; set; } = "";
}
