using System.Globalization;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Planning;

/// <summary>
/// One trip test to make before it is made: the current to inject, how to start, how long to hold a no-trip test, and
/// the window a result must fall in, taken from the same envelope the check judges with.
/// </summary>
/// <param name="Label">The point's name, e.g. "a" (IEC 60898-1 Table 7 row a), "1.2 Isd" or "5 x pickup".</param>
/// <param name="Current">The current to inject.</param>
/// <param name="Multiple">That current over the envelope's reference current.</param>
/// <param name="Conditions">The start and the poles to load.</param>
/// <param name="HoldFor">For a no-trip test, how long the device must carry the current; null when a trip is expected.</param>
/// <param name="Window">The band at this current for these conditions: what the check will hold the result to.</param>
/// <param name="Basis">The requirement the point comes from, with its source, or why the point is on the plan.</param>
public sealed record PlannedTrip(string Label, Amperes Current, CurrentMultiple Multiple, TestConditions Conditions, Seconds? HoldFor,
    AppliedBand Window, string Basis)
{
    /// <summary>True when the test starts straight after the one before it, as row b follows row a, with no cooling between.</summary>
    public bool StraightAfterPrevious { get; init; }

    /// <summary>The pole code a record of this test carries: "all", or "1" when one pole of a multipole breaker is loaded.</summary>
    public Pole Pole => Conditions.Loading == PoleLoading.OnePole ? Pole.Parse("1") : Pole.All;

    /// <summary>What result passes, in words, e.g. "no trip within 1 h", "trip after 1 s and before 60 s".</summary>
    public string Acceptance
    {
        get
        {
            if (HoldFor is { } hold)
            {
                return $"no trip within {Duration(hold)}";
            }

            if (!Window.HasRequirement)
            {
                return "no requirement at this current: record the result for the trend";
            }

            if (Window.Minimum.Limit is null)
            {
                return "must not trip";
            }

            var min = Window.Minimum.IsOpen || Window.Minimum.Limit.Value.Value == 0
                ? null
                : $"{(Window.Minimum.Strict ? "after" : "at or after")} {Duration(Window.Minimum.Limit.Value)}";
            var max = Window.Maximum.Limit is { } m ? $"{(Window.Maximum.Strict ? "before" : "by")} {Duration(m)}" : null;
            return (min, max) switch
            {
                (null, null) => "any trip time",
                (null, { } x) => $"trip {x}",
                ({ } n, null) => $"trip {n} (no upper limit here)",
                ({ } n, { } x) => $"trip {n} and {x}",
            };
        }
    }

    /// <summary>The drawn (typical) window in words when it is narrower than the guaranteed one; advisory only.</summary>
    public string? Typical =>
        Window.TypicalMinimum is null && Window.TypicalMaximum is null
            ? null
            : $"typically {(Window.TypicalMinimum?.Limit is { } n ? Duration(n) : "—")} to {(Window.TypicalMaximum?.Limit is { } x ? Duration(x) : "—")} (drawn curve, advisory only)";

    /// <summary>A time for a person: hours and minutes where they read better than seconds.</summary>
    public static string Duration(Seconds time) => time.Value switch
    {
        >= 3600 when time.Value % 3600 == 0 => (time.Value / 3600).ToString("0", CultureInfo.InvariantCulture) + " h",
        >= 600 when time.Value % 60 == 0 => (time.Value / 60).ToString("0", CultureInfo.InvariantCulture) + " min",
        _ => time.ToString(),
    };
}
