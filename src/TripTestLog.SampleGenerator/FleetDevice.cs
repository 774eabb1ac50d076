namespace TripTestLog.SampleGenerator;

/// <summary>What the demo fleet says of one breaker, including the story its test history should tell.</summary>
/// <param name="Tag">Asset tag.</param>
/// <param name="Site">Site index, 0 or 1.</param>
/// <param name="Location">Board and way.</param>
/// <param name="Curve">B, C or D.</param>
/// <param name="Rated">Rated current in amperes.</param>
/// <param name="Poles">Number of poles.</param>
/// <param name="Story">The behaviour the generator gives it.</param>
internal sealed record FleetDevice(string Tag, int Site, string Location, char Curve, double Rated, int Poles, DeviceStory Story);

/// <summary>The few behaviours the demo shows beside the healthy majority.</summary>
internal enum DeviceStory
{
    Healthy,

    /// <summary>The 2.55 In trip time grows year on year towards the upper limit.</summary>
    DriftingSlow,

    /// <summary>In the last year the 1.45 In warm test holds for the full hour: too late.</summary>
    FailsConventionalTrip,

    /// <summary>One pole's contact resistance rises each year past the maker's limit.</summary>
    RisingContactResistance,
}
