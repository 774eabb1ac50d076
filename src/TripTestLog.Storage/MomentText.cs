using System.Globalization;

namespace TripTestLog.Storage;

/// <summary>A moment the tool records (an import, a change), written as ISO 8601 UTC text where a database keeps text.</summary>
internal static class MomentText
{
    public static string Write(DateTimeOffset at) => at.ToUniversalTime().ToString("yyyy-MM-ddTHH:mm:ssZ", CultureInfo.InvariantCulture);

    public static DateTimeOffset Read(string utc) =>
        DateTimeOffset.Parse(utc, CultureInfo.InvariantCulture, DateTimeStyles.AssumeUniversal | DateTimeStyles.AdjustToUniversal);
}
