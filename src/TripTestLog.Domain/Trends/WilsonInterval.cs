namespace TripTestLog.Domain.Trends;

/// <summary>
/// A proportion with its Wilson score interval (E. B. Wilson, "Probable inference, the law of succession, and
/// statistical inference", JASA 22 (1927) 209–212): unlike the plain p ± z·√(p(1−p)/n), it stays within 0 to 1 and
/// gives a sensible width at 0 of n and n of n, which suits a handful of failures among a few dozen breakers.
/// </summary>
/// <param name="Successes">How many of the trials had the property (failures, here).</param>
/// <param name="Trials">How many trials (devices tested).</param>
/// <param name="Lower">The interval's lower end, 0 to 1.</param>
/// <param name="Upper">The interval's upper end, 0 to 1.</param>
public readonly record struct WilsonInterval(int Successes, int Trials, double Lower, double Upper)
{
    /// <summary>The two-sided 95 % normal quantile, 1.959964 (the 97.5th percentile of the standard normal).</summary>
    public const double Z95 = 1.959963984540054;

    /// <summary>The observed proportion, successes over trials.</summary>
    public double Proportion => (double)Successes / Trials;

    /// <summary>
    /// The interval for <paramref name="successes"/> of <paramref name="trials"/> at the normal quantile
    /// <paramref name="z"/>: (p + z²/2n ± z·√(p(1−p)/n + z²/4n²)) / (1 + z²/n). Throws
    /// <see cref="ArgumentOutOfRangeException"/> for no trials, successes outside 0..trials, or z not positive and finite.
    /// </summary>
    public static WilsonInterval Of(int successes, int trials, double z = Z95)
    {
        if (trials < 1)
        {
            throw new ArgumentOutOfRangeException(nameof(trials), trials, "expected at least 1 trial");
        }

        if (successes < 0 || successes > trials)
        {
            throw new ArgumentOutOfRangeException(nameof(successes), successes, $"expected 0 to {trials}");
        }

        if (!double.IsFinite(z) || z <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(z), z, "expected a positive, finite quantile");
        }

        double n = trials;
        var p = successes / n;
        var z2 = z * z;
        var centre = (p + z2 / (2 * n)) / (1 + z2 / n);
        var half = z / (1 + z2 / n) * Math.Sqrt(p * (1 - p) / n + z2 / (4 * n * n));

        // At 0 of n and n of n the formula gives exactly 0 or 1 in real arithmetic; clamp the rounding error.
        return new WilsonInterval(successes, trials, Math.Max(0, centre - half), Math.Min(1, centre + half));
    }
}
