using TripTestLog.Domain.Devices;

namespace TripTestLog.Domain.Tests.Assets;

/// <summary>The tag rule: one device whatever the case of its letters A to Z, as a lab means it (project rule, not a standard).</summary>
public sealed class AssetTagTests
{
    [Fact]
    public void TagsDifferingOnlyInTheCaseOfAtoZ_AreOneDevice()
    {
        Assert.Equal(AssetTag.Of("ARW-MSB-Q01"), AssetTag.Of("arw-msb-q01"));
        Assert.Equal(AssetTag.Of("ARW-MSB-Q01").GetHashCode(), AssetTag.Of("Arw-Msb-Q01").GetHashCode());
        Assert.True(AssetTag.Comparer.Equals("abc-1", "ABC-1"));
    }

    [Fact]
    public void OtherCharacters_CompareExactly_AsTheDatabaseDoes()
    {
        // SQLite's NOCASE folds only A to Z; the tag rule is the same, so a lookup in code and in SQL agree.
        Assert.NotEqual(AssetTag.Of("PUMPE-Ä1"), AssetTag.Of("PUMPE-ä1"));
        Assert.NotEqual(AssetTag.Of("ARW-MSB-Q01"), AssetTag.Of("ARW-MSB-Q02"));
    }

    [Fact]
    public void ATag_KeepsItsSpelling()
    {
        Assert.Equal("arw-msb-q01", AssetTag.Of("arw-msb-q01").Value);
    }
}
