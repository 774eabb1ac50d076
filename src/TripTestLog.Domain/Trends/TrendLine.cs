namespace TripTestLog.Domain.Trends;

/// <summary>A straight trend through observations: value = Intercept + Slope × year.</summary>
/// <param name="Slope">Change of the value per year.</param>
/// <param name="Intercept">The value at year zero (only meaningful with the slope).</param>
/// <param name="Spread">
/// Robust scatter of the observations about the line: 1.4826 × the median absolute residual, comparable with a
/// standard deviation for normal scatter.
/// </param>
/// <param name="Count">How many observations the line rests on.</param>
/// <param name="LastYear">The year of the latest observation: forecasts run from here.</param>
public sealed record TrendLine(double Slope, double Intercept, double Spread, int Count, double LastYear)
{
    /// <summary>The line's value at <paramref name="year"/>.</summary>
    public double At(double year) => Intercept + Slope * year;

    /// <summary>
    /// The year the line reaches <paramref name="level"/> moving along its slope; the latest observation's year when it
    /// has already passed it; null when the line is flat.
    /// </summary>
    public double? Reaches(double level)
    {
        if (Slope == 0)
        {
            return null;
        }

        var year = (level - Intercept) / Slope;
        return year > LastYear ? year : LastYear;
    }
}
