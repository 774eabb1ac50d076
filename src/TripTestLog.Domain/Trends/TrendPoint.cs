namespace TripTestLog.Domain.Trends;

/// <summary>One observation for a trend: when (in years, fractional) and what.</summary>
/// <param name="Year">The time of the observation as a fractional year, e.g. 2024.5.</param>
/// <param name="Value">The observed value, in the trend's own scale (a logarithm, a resistance).</param>
public readonly record struct TrendPoint(double Year, double Value)
{
    /// <summary>The fractional year of <paramref name="date"/>: the year plus the elapsed fraction of it.</summary>
    public static double YearOf(DateOnly date)
    {
        var start = new DateOnly(date.Year, 1, 1);
        var length = DateOnly.FromDateTime(start.ToDateTime(TimeOnly.MinValue).AddYears(1)).DayNumber - start.DayNumber;
        return date.Year + (double)(date.DayNumber - start.DayNumber) / length;
    }

    /// <summary>The date of a fractional year, to the day.</summary>
    public static DateOnly DateOf(double year)
    {
        var whole = (int)Math.Floor(year);
        var start = new DateOnly(whole, 1, 1);
        var length = DateOnly.FromDateTime(start.ToDateTime(TimeOnly.MinValue).AddYears(1)).DayNumber - start.DayNumber;
        return start.AddDays((int)Math.Round((year - whole) * length));
    }
}
