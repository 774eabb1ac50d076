using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Verdicts;

/// <summary>The verdict rules: conclusive failures first, then failures the test's conditions cannot support, then what it shows.</summary>
public static partial class TripJudge
{
    private sealed record Judged(Verdict Verdict, string Reason, BandEdge? Edge, IReadOnlyList<string> Notes);

    private static Judged Decide(TripBand band, AppliedBand applied, TripOutcome outcome, TestConditions conditions, ITripEnvelope envelope, Amperes current)
    {
        var t = outcome.Time;
        var min = applied.Minimum;
        var max = applied.Maximum;
        var what = outcome.Tripped ? $"tripped after {t}" : $"held {t} without tripping";

        // 0. Requirements that contradict each other (a registered curve table against the settings, say) judge nothing.
        if (max.Limit is { } cap && (min.Limit is null || min.Limit.Value > cap))
        {
            return new(Verdict.NotAssessable,
                $"the requirements at this current contradict each other: {min.Requirement} against {max.Requirement}; check the register and its tables", null, []);
        }

        // 1. A guaranteed edge the test can speak to is broken.
        if (outcome.Tripped && !min.IsOpen && min.TripIsBefore(t))
        {
            var limit = min.Limit is { } m ? $"the {m} minimum" : "a current where it must not operate at all";
            return new(Verdict.TooEarly, $"{what}, before {limit} ({min.Requirement})", min, []);
        }

        if (max.Limit is { } latest && (outcome.Tripped ? max.TripIsAfter(t) : t >= latest))
        {
            var must = max.Strict ? $"trip in less than {latest}" : $"trip within {latest}";
            return new(Verdict.TooLate, $"{what}; it must {must} ({max.Requirement})", max, []);
        }

        // 2. A guaranteed edge is broken, but it assumes conditions the test did not meet.
        var guaranteedMins = band.Minimums.Where(e => e.Strength == EdgeStrength.Guaranteed).ToList();
        var guaranteedMaxs = band.Maximums.Where(e => e.Strength == EdgeStrength.Guaranteed).ToList();
        if (outcome.Tripped && guaranteedMins.FirstOrDefault(e => !e.IsOpen && e.TripIsBefore(t)) is { Requirement: not null } early)
        {
            return new(Verdict.NotAssessable,
                $"{what}, before the {early.Limit} minimum, but that limit assumes {early.Assumes()} and this test ({conditions}) trips sooner, so it proves nothing ({early.Requirement}); repeat {Repeat(early)}",
                early, []);
        }

        if (guaranteedMaxs.FirstOrDefault(e => e.Limit is { } l && (outcome.Tripped ? e.TripIsAfter(t) : t >= l)) is { Requirement: not null } late)
        {
            return new(Verdict.NotAssessable,
                $"{what}, past the {late.Limit} maximum, but that limit assumes {late.Assumes()} and this test ({conditions}) trips later, so it proves nothing ({late.Requirement}); repeat {Repeat(late)}",
                late, []);
        }

        return outcome.Tripped
            ? TripShows(guaranteedMins, guaranteedMaxs, applied, conditions, t, envelope.IsThermal(current))
            : HoldShows(guaranteedMins, applied, conditions, envelope, current, t);
    }

    private static Judged TripShows(List<BandEdge> mins, List<BandEdge> maxs, AppliedBand applied, TestConditions conditions, Seconds t, bool thermal)
    {
        // The trip shows an edge when the test ran no cooler than a minimum assumes (it would trip no sooner under the
        // minimum's own conditions) or no hotter than a maximum assumes (it would trip no later).
        var shown = mins.Where(e => !e.IsOpen && e.TestAtLeastAsHot(conditions))
            .Concat(maxs.Where(e => e.TestAtMostAsHot(conditions)))
            .ToList();
        if (shown.Count == 0)
        {
            return new(Verdict.NotAssessable, $"tripped after {t}; no requirement at this current can be shown by a test run {conditions}", null, []);
        }

        var notes = maxs
            .Where(e => !e.TestAtMostAsHot(conditions) && e.Start == StartCondition.Cold && !e.AnyStart && conditions.Start == StartCondition.Warm)
            .Select(e => $"a warm start trips sooner: this test does not show {e.Requirement}; repeat from cold to show it")
            .ToList();
        if (thermal && mins.All(e => e.IsOpen))
        {
            notes.Add("the standard sets no minimum at this current, so only the trip-by limit was checked; enter the maker's curve as a curve table to judge the time itself");
        }

        var decisive = shown.FirstOrDefault(e => e.Source is EdgeSource.NormativePoint or EdgeSource.Characteristic);
        var edge = decisive.Requirement is null ? shown[0] : decisive;
        var inside = applied.Maximum.Limit is null && applied.Minimum.IsOpen
            ? $"meets {edge.Requirement}"
            : $"inside {applied.Range}";
        return new(Verdict.Pass, $"tripped after {t}, {inside}", edge, notes);
    }

    private static Judged HoldShows(List<BandEdge> mins, AppliedBand applied, TestConditions conditions, ITripEnvelope envelope, Amperes current, Seconds held)
    {
        var max = applied.Maximum;

        // A hold long enough at or above a no-trip point's current proves the point: a lower current trips later still.
        var proved = envelope.Points
            .Where(p => p.IsNoTripPoint && held >= p.MustHoldFor!.Value && current.Value >= p.Multiple.Value * envelope.Reference.Value * (1 - 1e-9))
            .Where(p => p.HoldEdge(carried: false).TestAtLeastAsHot(conditions))
            .OrderByDescending(p => p.Multiple)
            .FirstOrDefault();
        if (proved is not null)
        {
            return new(Verdict.Pass, $"held {held} without tripping, as required ({proved.Requirement})", proved.HoldEdge(carried: false), []);
        }

        if (max.Limit is { } latest)
        {
            return new(Verdict.NotAssessable, $"held {held} and stopped before the {latest} trip-by limit ({max.Requirement}); a hold here shows no trip: run the test to a trip", null, []);
        }

        // Elsewhere the hold must reach the latest minimum it can prove: one that assumes a start and loading no hotter than
        // the test's (a hotter test that held shows a cooler one would hold too).
        if (TripBand.Tightest(mins, EdgeStrength.Guaranteed, e => !e.IsOpen && e.TestAtLeastAsHot(conditions), minimum: true) is not { } provable)
        {
            return new(Verdict.NotAssessable, $"held {held}; a hold proves nothing where the release may act at once", null, []);
        }

        if (provable.Limit is null || held >= provable.Limit.Value)
        {
            return new(Verdict.Pass, $"held {held} without tripping, as required ({provable.Requirement})", provable, []);
        }

        return new(Verdict.NotAssessable, $"held only {held}; the no-trip requirement here runs to {provable.Limit} ({provable.Requirement})", null, []);
    }

    private static string Repeat(BandEdge edge) => edge.Assumes() is { Length: > 0 } a ? a : "under the standard's conditions";
}
