using TripTestLog.Application.Import;

namespace TripTestLog.Application.Tests;

/// <summary>
/// The rules a correction follows, without a database: how its rows line up with the file it corrects, and what
/// counts as a changed value. (The pairing test moved here unchanged from the import tests.)
/// </summary>
public sealed class CorrectionRuleTests
{
    [Fact]
    public void Pairing_FollowsTheAnchors_LikeALineDiff()
    {
        // Earlier lines 2..6 = A B C D E; new lines 2..5 = A C D' E: B deleted, D changed.
        var (pairs, left) = CorrectionPairing.Pair([(2, 2), (4, 3), (6, 5)], [(20, 3), (40, 5)], [(90, 4)]);

        Assert.Equal([(40L, 90L)], pairs);
        Assert.Equal([(20L, 3L)], left);
    }

    [Fact]
    public void Changes_AreTheColumnsWhoseTextDiffers_InColumnOrder()
    {
        var changes = RecordChanges.Between(["device_id", "time_s", "note"], ["BF-01", "1.5", "ok"], ["BF-02", "1.5", "OK"]).ToList();

        // Text is compared exactly: a note changed only in case is a change the audit trail keeps.
        Assert.Equal([("device_id", "BF-01", "BF-02"), ("note", "ok", "OK")], changes);
    }

    [Fact]
    public void AnIdenticalRow_ChangesNothing()
    {
        Assert.Empty(RecordChanges.Between(["a", "b"], ["1", "2"], ["1", "2"]));
    }
}
