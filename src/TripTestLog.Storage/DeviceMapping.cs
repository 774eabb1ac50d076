using System.Data.Common;
using System.Globalization;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Storage;

/// <summary>Reads a device from a row laid out as asset_tag followed by the register columns, in their stored order.</summary>
internal static class DeviceMapping
{
    public static Device Read(DbDataReader r, int first = 0) => new(
        AssetTag.Of(r.GetString(first)),
        r.GetString(first + 1),
        r.GetString(first + 2),
        Codes.Family(r.GetString(first + 3)),
        Codes.Curve(r.GetString(first + 4)),
        Amperes.Of(r.GetDouble(first + 5)),
        r.GetInt32(first + 6),
        Volts.Of(r.GetDouble(first + 7)),
        r.IsDBNull(first + 8) ? null : DateOnly.ParseExact(r.GetString(first + 8), "yyyy-MM-dd", CultureInfo.InvariantCulture),
        r.IsDBNull(first + 9) ? null : MicroOhms.Of(r.GetDouble(first + 9)),
        r.GetString(first + 10),
        r.GetString(first + 11),
        r.GetString(first + 12));
}
