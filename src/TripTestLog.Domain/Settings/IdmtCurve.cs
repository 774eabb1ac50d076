namespace TripTestLog.Domain.Settings;

/// <summary>The inverse-time characteristics of IEC 60255-151 and IEEE C37.112.</summary>
public enum IdmtCurve
{
    /// <summary>IEC 60255-151 standard inverse (type A).</summary>
    StandardInverse,

    /// <summary>IEC 60255-151 very inverse (type B).</summary>
    VeryInverse,

    /// <summary>IEC 60255-151 extremely inverse (type C).</summary>
    ExtremelyInverse,

    /// <summary>IEC 60255-151 long-time inverse.</summary>
    LongTimeInverse,

    /// <summary>IEEE C37.112 moderately inverse.</summary>
    IeeeModeratelyInverse,

    /// <summary>IEEE C37.112 very inverse.</summary>
    IeeeVeryInverse,

    /// <summary>IEEE C37.112 extremely inverse.</summary>
    IeeeExtremelyInverse,
}
