using TripTestLog.Application.Text;

namespace TripTestLog.Cli.Tests;

/// <summary>
/// Edit distance with adjacent swaps (optimal string alignment; Damerau 1964, Levenshtein 1966 as commonly defined) and
/// the nearest-name rule built on it: close matches only, case of A-Z ignored, a tie offers nothing.
/// </summary>
public sealed class SpellingTests
{
    [Theory]
    // Hand-counted: one swap (es/se); one deletion; one insertion; kitten/sitting, the textbook example, 3.
    [InlineData("asest", "asset", 1)]
    [InlineData("delimitter", "delimiter", 1)]
    [InlineData("chek", "check", 1)]
    [InlineData("kitten", "sitting", 3)]
    [InlineData("FHM-DB3-QO2", "fhm-db3-q02", 1)]
    [InlineData("", "abc", 3)]
    public void Distance_CountsInsertionsDeletionsSubstitutionsAndSwaps(string a, string b, int expected) =>
        Assert.Equal(expected, Spelling.Distance(a, b));

    [Fact]
    public void Nearest_OffersOnlyACloseUniqueMatch()
    {
        string[] tags = ["FHM-DB3-Q01", "FHM-DB3-Q02", "ARW-DB1-Q01"];

        Assert.Equal("FHM-DB3-Q02", Spelling.Nearest("fhm-db3-qo2", tags));
        Assert.Null(Spelling.Nearest("FHM-DB3-Q0", tags));           // one edit from both Q01 and Q02: a tie offers neither
        Assert.Null(Spelling.Nearest("XYZ-PANEL-9", tags));          // nothing close
        Assert.Null(Spelling.Nearest("zz", ["ab", "cd"]));            // two letters, two edits: too far for a short word
    }
}

/// <summary>A count and its noun agree in number (English grammar; no source needed beyond it).</summary>
public sealed class CountedTests
{
    [Theory]
    [InlineData(0, "0 device pages")]
    [InlineData(1, "1 device page")]
    [InlineData(2, "2 device pages")]
    public void TheNounFollowsTheCount(long count, string expected) => Assert.Equal(expected, Counted.Of(count, "device page"));
}
