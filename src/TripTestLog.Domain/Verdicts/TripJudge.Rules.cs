using System.Globalization;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Verdicts;

/// <summary>The verdict rules: failures first, then failures the test's conditions cannot support, then what it proves.</summary>
public static partial class TripJudge
{
    private sealed record Case(PointWindowEnvelope Envelope, TripBand Band, AppliedBand Applied, TripOutcome Outcome, TestConditions Conditions, double Multiple,
        NormativePoint? AimedAt)
    {
        public string At => $"{Multiple.ToString("0.###", CultureInfo.InvariantCulture)} {Envelope.ReferenceName}";

        /// <summary>The point whose window the test lies in when the test's start or loading differs from the point's.</summary>
        public NormativePoint? OtherStart => AimedAt is null
            ? Envelope.Points.Where(p => p.Within(Multiple, Envelope.Window))
                .OrderBy(p => Math.Abs(Multiple / p.Multiple.Value - 1.0)).FirstOrDefault()
            : null;

        public string StartMismatch(NormativePoint p)
        {
            var assumes = p.HoldEdge(carried: false).Assumes();
            return $"at {At}, in {p.Label}'s window, but {p.Label} assumes {assumes} and this test ran {Conditions}, so it proves nothing there "
                + $"({p.Requirement}); repeat at {p.Where(Envelope.ReferenceName)}{(p.Loading == PoleLoading.AllPoles && Conditions.Loading != PoleLoading.AllPoles ? " with all poles loaded" : "")}";
        }
    }

    private sealed record Proof(string Requirement, BandEdge Edge, NormativePoint? Point);

    private sealed record Judged(Verdict Verdict, string Reason, BandEdge? Edge, IReadOnlyList<string> Notes, IReadOnlyList<Proof> Proved, AppliedBand? Band);

    private static Judged Decide(Case c)
    {
        var (band, applied, outcome, conditions) = (c.Band, c.Applied, c.Outcome, c.Conditions);
        var t = outcome.Time;
        var min = applied.Minimum;
        var max = applied.Maximum;
        var what = outcome.Tripped ? $"tripped after {t}" : $"held {t} without tripping";

        // 0. Requirements that contradict each other (a registered curve table against the settings, say) judge nothing.
        if (max.Limit is { } cap && (min.Limit is null || min.Limit.Value > cap))
        {
            return NotAssessable($"the requirements at this current contradict each other: {min.Requirement} against {max.Requirement}; check the register and its tables");
        }

        // 1. A guaranteed edge the test can speak to is broken.
        if (outcome.Tripped && !min.IsOpen && min.TripIsBefore(t))
        {
            var limit = min.Limit is { } m ? $"the {m} minimum" : "a current where it must not operate at all";
            return new(Verdict.TooEarly, $"{what}, before {limit} ({min.Requirement}){Fortiori(min, conditions, cooler: true)}", min, [], [], null);
        }

        if (max.Limit is { } latest && (outcome.Tripped ? max.TripIsAfter(t) : t >= latest))
        {
            var must = max.Strict ? $"trip in less than {latest}" : $"trip within {latest}";
            return new(Verdict.TooLate, $"{what}; it must {must} ({max.Requirement}){Fortiori(max, conditions, cooler: false)}", max, [], [], null);
        }

        // 2. A guaranteed edge is broken, but it assumes conditions the test did not meet: the band reported is the one cited.
        var guaranteedMins = Guaranteed(band.Minimums);
        var guaranteedMaxs = Guaranteed(band.Maximums);
        if (outcome.Tripped && FirstEarly(guaranteedMins, t) is { Requirement: not null } early)
        {
            return new(Verdict.NotAssessable,
                $"{what}, before the {early.Limit} minimum, but that limit assumes {early.Assumes()} and this test ({conditions}) trips sooner, so it proves nothing ({early.Requirement}); repeat {Repeat(early)}",
                early, [], [], applied with { Minimum = early });
        }

        if (FirstLate(guaranteedMaxs, outcome) is { Requirement: not null } late)
        {
            return new(Verdict.NotAssessable,
                $"{what}, past the {late.Limit} maximum, but that limit assumes {late.Assumes()} and this test ({conditions}) trips later, so it proves nothing ({late.Requirement}); repeat {Repeat(late)}",
                late, [], [], applied with { Maximum = late });
        }

        // 3. Nothing broken: a pass needs a requirement the test proves.
        // A test within a point's window (with the point's loading, whatever its start) passes only by proving that
        // point: a 1.45 In test started cold does not pass on row a a fortiori.
        var proofs = outcome.Tripped ? TripProofs(c, guaranteedMins, guaranteedMaxs) : HoldProofs(c, guaranteedMins, guaranteedMaxs);
        var near = c.Envelope.Points.Where(p => p.Within(c.Multiple, c.Envelope.Window) && (p.Loading is null || p.Loading == conditions.Loading)).ToList();
        if (near.Count > 0 && !proofs.Any(p => p.Point is { } proved && near.Contains(proved)))
        {
            proofs.Clear();
        }

        if (proofs.Count > 0)
        {
            return new(Verdict.Pass, $"{what}; proves {proofs[0].Requirement}", proofs[0].Edge, PassNotes(c, guaranteedMins, guaranteedMaxs), proofs, null);
        }

        if (!band.HasRequirement && (outcome.Tripped || guaranteedMaxs.Count == 0))
        {
            return NotAssessable($"{what} at {c.At}: {band.NoRequirement}; {Hint(c)}");
        }

        return NotAssessable(outcome.Tripped ? UnprovedTrip(c) : UnprovedHold(c, guaranteedMaxs));
    }

    private static Judged NotAssessable(string reason) => new(Verdict.NotAssessable, reason, null, [], [], null);

    // Every test is judged through these, so they walk the band's short lists with no delegate or closure to make.
    private static List<BandEdge> Guaranteed(IReadOnlyList<BandEdge> edges)
    {
        var guaranteed = new List<BandEdge>(edges.Count);
        for (var i = 0; i < edges.Count; i++)
        {
            if (edges[i].Strength == EdgeStrength.Guaranteed)
            {
                guaranteed.Add(edges[i]);
            }
        }

        return guaranteed;
    }

    private static BandEdge? FirstEarly(List<BandEdge> minimums, Seconds t)
    {
        foreach (var e in minimums)
        {
            if (!e.IsOpen && e.TripIsBefore(t))
            {
                return e;
            }
        }

        return null;
    }

    private static BandEdge? FirstLate(List<BandEdge> maximums, TripOutcome outcome)
    {
        var t = outcome.Time;
        foreach (var e in maximums)
        {
            if (e.Limit is { } l && (outcome.Tripped ? e.TripIsAfter(t) : t >= l))
            {
                return e;
            }
        }

        return null;
    }

    // A trip proves a trip-by limit it came within at a current no higher than the limit's (within the window above it),
    // run no hotter than assumed; and a no-trip limit it came after at a current no lower (within the window below),
    // run at least as hot. Settings, the relay formula in its range and curve-table rows prove at their own current.
    private static List<Proof> TripProofs(Case c, List<BandEdge> mins, List<BandEdge> maxs)
    {
        var t = c.Outcome.Time;
        var w = c.Envelope.Window;
        var proofs = new List<Proof>();
        foreach (var p in c.Envelope.Points)
        {
            // A point with both limits (IEC 60898-1 row c) is proved inside its window only by a trip within both; below
            // the window a trip within its trip-by limit proves that limit a fortiori, above it a trip after its no-trip one.
            var mp = p.Multiple.Value;
            var tripSide = c.Multiple <= mp * (1 + w) && p.TripEdge(carried: false) is { Limit: not null } trip
                && !trip.TripIsAfter(AtReference(c, p, t, tripBy: true)) && trip.TestAtMostAsHot(c.Conditions);
            var holdSide = c.Multiple >= mp * (1 - w) && p.HoldEdge(carried: false) is { Limit: not null } hold
                && !hold.TripIsBefore(AtReference(c, p, t, tripBy: false)) && hold.TestAtLeastAsHot(c.Conditions);
            var both = p.MustTripWithin is not null && p.MustHoldFor is not null;
            if (both ? (p.Within(c.Multiple, w) ? tripSide && holdSide : tripSide || holdSide) : tripSide || holdSide)
            {
                var half = !both || p.Within(c.Multiple, w) ? "" : tripSide ? ", its trip-by limit, a fortiori at a lower current" : ", its no-trip limit, a fortiori at a higher current";
                proofs.Add(new Proof(p.Requirement + half, tripSide ? p.TripEdge(carried: false) : p.HoldEdge(carried: false), p));
            }
        }

        foreach (var e in maxs)
        {
            if (Proves(e, c) && !e.TripIsAfter(t) && e.TestAtMostAsHot(c.Conditions))
            {
                proofs.Add(new Proof(e.Requirement, e, null));
            }
        }

        foreach (var e in mins)
        {
            if (Proves(e, c) && !e.IsOpen && e.Limit is not null && !e.TripIsBefore(t) && e.TestAtLeastAsHot(c.Conditions))
            {
                proofs.Add(new Proof(e.Requirement, e, null));
            }
        }

        return Nearest(proofs, c);
    }

    // A hold proves a no-trip limit it lasted at a current no lower than the limit's (within the window below it), run at
    // least as hot. Where the device must operate a hold is a trip not yet seen: it proves only a no-trip point whose own
    // test it is (within the point's window, e.g. row d's short hold), never a limit a fortiori or a setting's minimum.
    private static List<Proof> HoldProofs(Case c, List<BandEdge> mins, List<BandEdge> maxs)
    {
        var mustOperate = maxs.Count > 0;
        var held = c.Outcome.Time;
        var w = c.Envelope.Window;
        var proofs = new List<Proof>();
        foreach (var p in c.Envelope.Points)
        {
            if (p.IsNoTripPoint && p.MustHoldFor is { } h && AtReference(c, p, held, tripBy: false) >= h && c.Multiple >= p.Multiple.Value * (1 - w) && (!mustOperate || p.Within(c.Multiple, w))
                && p.HoldEdge(carried: false) is var edge && edge.TestAtLeastAsHot(c.Conditions))
            {
                proofs.Add(new Proof(p.Requirement, edge, p));
            }
        }

        if (mustOperate)
        {
            return Nearest(proofs, c);
        }

        // A setting's minimum is a floor with no hold time of its own: a hold past it proves nothing. Only "must not
        // operate at all" (a relay below its start) states how long a hold must last.
        proofs.AddRange(mins.Where(e => Proves(e, c) && e.TestAtLeastAsHot(c.Conditions) && e.Limit is null && e.ProvenByHolding is { } need && held >= need)
            .Select(e => new Proof(e.Requirement, e, null)));
        return Nearest(proofs, c);
    }

    // The time a test at a non-reference ambient stands for at the reference, taken against the test (a proof must hold
    // however the ambient moved the release): a hot release trips sooner, so its trip stands for up to a stretched time; a
    // cold one later, so its hold or late trip stands for as little as a shrunk time. Magnetic points do not move.
    private static Seconds AtReference(Case c, NormativePoint p, Seconds t, bool tripBy)
    {
        var shift = c.Envelope.Ambient;
        if (shift.IsNone || p.HighestUltimate is not { } u)
        {
            return t;
        }

        var m = c.Multiple;
        var factor = tripBy
            ? OffsetBound.Stretch(m, m * shift.Upper, u)
            : OffsetBound.Shrink(m, m * shift.Lower, u);
        return Seconds.Of(double.IsInfinity(factor) ? double.MaxValue : t.Value * factor);
    }

    // A requirement stated at this current: a setting, the relay formula in its range, or a curve-table row within the window.
    private static bool Proves(BandEdge e, Case c) =>
        e.Source is EdgeSource.Setting or EdgeSource.Characteristic or EdgeSource.CurveTable or EdgeSource.Instantaneous
        && (e.Anchor is { } anchor ? Math.Abs(c.Multiple / anchor - 1.0) <= c.Envelope.Window + 1e-12 : !e.Carried);

    // The point nearest the test current first: it is the one the test was most likely aimed at (a stable order, so
    // proofs as near keep the order they were found in; one proof or none is already in order).
    private static List<Proof> Nearest(List<Proof> proofs, Case c) =>
        proofs.Count <= 1 ? proofs : proofs.OrderBy(p => p.Point is { } pt ? Math.Abs(Math.Log(c.Multiple / pt.Multiple.Value)) : 0.0).ToList();

    private static List<string> PassNotes(Case c, List<BandEdge> mins, List<BandEdge> maxs)
    {
        var notes = maxs
            .Where(e => !e.TestAtMostAsHot(c.Conditions) && e.Start == StartCondition.Cold && !e.AnyStart && c.Conditions.Start == StartCondition.Warm)
            .Select(e => $"a warm start trips sooner: this test does not show {e.Requirement}; repeat from cold to show it")
            .ToList();
        if (c.Outcome.Tripped && c.Envelope.IsThermal(c.Band.Current) && mins.All(e => e.IsOpen || e.Source == EdgeSource.Derived))
        {
            notes.Add("the standard sets no minimum at this current, only an I²t floor; enter the maker's curve as a curve table to judge an early trip");
        }

        return notes;
    }

    private static string UnprovedTrip(Case c)
    {
        var t = c.Outcome.Time;

        if (c.OtherStart is { } other)
        {
            return $"tripped after {t} {c.StartMismatch(other)}";
        }

        // Aimed at a point, past its limit but within what the current offset or the ambient can explain: neither broken nor proved.
        if (c.AimedAt is { } p)
        {
            var side = p.MustTripWithin is { } lim && t.Value >= lim.Value ? $"past {p.Label}'s {lim}"
                : p.MustHoldFor is { } hold && t.Value <= hold.Value ? $"before {p.Label}'s {hold}" : null;
            if (side is not null)
            {
                var offset = Math.Abs(c.Multiple / p.Multiple.Value - 1) > 1e-9 ? $"the current {Pct(c.Multiple, p)} {(c.Multiple < p.Multiple.Value ? "below" : "above")} its point" : "";
                var ambient = c.Envelope.AmbientWords is { Length: > 0 } a && p.HighestUltimate is not null ? $"the ambient ({a})" : "";
                var cause = string.Join(" and ", new[] { offset, ambient }.Where(x => x.Length > 0));
                return $"tripped after {t} at {c.At}, {side}, but within what {(cause.Length > 0 ? cause : "the test's conditions")} can explain "
                    + $"({p.Requirement}); repeat at {p.Where(c.Envelope.ReferenceName)}{(ambient.Length > 0 ? " nearer the reference ambient" : "")}";
            }
        }

        return $"tripped after {t} at {c.At}; no requirement is proved by a trip here: {Hint(c)}";
    }

    private static string UnprovedHold(Case c, List<BandEdge> maxs)
    {
        if (c.OtherStart is { } other && c.Applied.Maximum.Limit is null)
        {
            return $"held {c.Outcome.Time} {c.StartMismatch(other)}";
        }

        var held = c.Outcome.Time;
        var max = c.Applied.Maximum;
        if (max.Limit is { } latest)
        {
            return $"held {held} and stopped before the {latest} trip-by limit ({max.Requirement}); a hold here shows no trip: run the test to a trip";
        }

        if (maxs.Count > 0)
        {
            var must = maxs[0];
            return $"held {held} at {c.At}; the device must operate here ({must.Requirement}), and that limit assumes {must.Assumes()}, "
                + $"so a hold shows nothing: run the test to a trip {Repeat(must)}";
        }

        var w = c.Envelope.Window;
        var needed = c.Envelope.Points
            .Where(p => p.MustHoldFor is { } h && held < h && c.Multiple >= p.Multiple.Value * (1 - w))
            .OrderBy(p => Math.Abs(Math.Log(c.Multiple / p.Multiple.Value)))
            .FirstOrDefault();
        if (needed is not null)
        {
            return $"held {held}; {needed.Label} needs {Long(needed.MustHoldFor!.Value)} at {needed.Where(c.Envelope.ReferenceName)} ({needed.Requirement})";
        }

        return $"held {held} at {c.At}; no requirement states a hold time here: {Hint(c)}";
    }

    // Which test would decide: the standard's nearest point, or for a band without points where its limits are stated.
    private static string Hint(Case c)
    {
        var nearest = Nearest(c.Envelope, c.Multiple, c.Conditions, c.Outcome.Tripped);
        if (nearest is not null)
        {
            return $"the standard's nearest point is {nearest.Brief(c.Envelope.ReferenceName)}: {nearest.Requirement}";
        }

        return c.Envelope.Inner is RelayEnvelope relay
            ? $"time the relay between {RelayEnvelope.AccuracyFrom:0} and {RelayEnvelope.AccuracyTo:0} x Is ({Amperes.Of(RelayEnvelope.AccuracyFrom * relay.Reference.Value)} to "
                + $"{Amperes.Of(RelayEnvelope.AccuracyTo * relay.Reference.Value)}), where {c.Envelope.Standard} declares its accuracy"
            : $"test at a current where {c.Envelope.Standard} states a limit of its own";
    }

    // A conventional time reads better in hours.
    private static string Long(Seconds s) =>
        s.Value >= 3600 && s.Value % 3600 == 0 ? $"{(s.Value / 3600).ToString("0", CultureInfo.InvariantCulture)} h" : s.ToString();

    // A trip is decided at a trip-by point, a hold at a no-trip one, with the test's loading.
    private static NormativePoint? Nearest(PointWindowEnvelope envelope, double multiple, TestConditions conditions, bool tripped) =>
        envelope.Points
            .OrderBy(p => p.Loading is null || p.Loading == conditions.Loading ? 0 : 1)
            .ThenBy(p => (tripped ? p.MustTripWithin : p.MustHoldFor) is null ? 1 : 0)
            .ThenBy(p => Math.Abs(Math.Log(multiple / p.Multiple.Value)))
            .FirstOrDefault();

    private static string Pct(double multiple, NormativePoint p) =>
        $"{Math.Abs(multiple / p.Multiple.Value - 1) * 100:0.0} %";

    // Where the limit assumes other conditions than the test's, why it still holds: the test ran no hotter (a minimum) or
    // at least as hot (a maximum) than the limit assumes.
    private static string Fortiori(BandEdge edge, TestConditions test, bool cooler)
    {
        var assumes = edge.Assumes();
        var start = !edge.AnyStart && edge.Start != test.Start;
        var loading = edge.Loading is { } l && l != test.Loading;
        return assumes.Length == 0 || (!start && !loading) ? ""
            : $"; this test ({test}) runs {(cooler ? "no hotter" : "at least as hot")} than that limit assumes ({assumes}), so it holds";
    }

    private static string Repeat(BandEdge edge) => edge.Assumes() is { Length: > 0 } a ? a : "under the standard's conditions";
}
