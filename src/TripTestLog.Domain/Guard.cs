namespace TripTestLog.Domain;

/// <summary>The one place where factories check their arguments, so every quantity rejects bad values alike.</summary>
internal static class Guard
{
    /// <summary>Rejects NaN, infinities and values outside [min, max], naming the parameter and the range.</summary>
    public static double InRange(double value, double min, double max, string paramName, string unit)
    {
        if (double.IsNaN(value) || double.IsInfinity(value))
        {
            throw new ArgumentOutOfRangeException(paramName, value, $"{paramName} must be a finite number of {unit}; got {value}.");
        }

        if (value < min || value > max)
        {
            throw new ArgumentOutOfRangeException(paramName, value, $"{paramName} must lie between {min} and {max} {unit}; got {value}.");
        }

        return value;
    }

    /// <summary>Rejects NaN, infinities, zero and negative values.</summary>
    public static double Positive(double value, string paramName, string unit)
    {
        if (double.IsNaN(value) || double.IsInfinity(value) || value <= 0)
        {
            throw new ArgumentOutOfRangeException(paramName, value, $"{paramName} must be a finite number of {unit} above zero; got {value}.");
        }

        return value;
    }

    /// <summary>Rejects NaN, infinities and negative values; zero is allowed.</summary>
    public static double NonNegative(double value, string paramName, string unit)
    {
        if (double.IsNaN(value) || double.IsInfinity(value) || value < 0)
        {
            throw new ArgumentOutOfRangeException(paramName, value, $"{paramName} must be a finite number of {unit}, zero or more; got {value}.");
        }

        return value;
    }
}
