using TripTestLog.Domain.Records;

namespace TripTestLog.Ingest.Tests;

/// <summary>Bad input yields a problem naming the line, the column and what to fix, and never a record.</summary>
public sealed class RecordFileReaderTests
{
    private const string TripHeader = "asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start\n";

    public static TheoryData<string, string, long, string, string> BadFiles => new()
    {
        // name, content, expected line, expected column, a phrase the reason must hold
        { "empty", "", 1, "", "empty" },
        { "header only", TripHeader, 1, "", "no data rows" },
        { "no known header", "alpha,beta\n1,2\n", 1, "", "matches no record kind" },
        { "unknown column", TripHeader.TrimEnd() + ",colour\nT-01,2024-03-18,as-found,all,18,,3600,cold,red\n", 1, "colour", "unknown column" },
        { "unknown unit", TripHeader.Replace("trip_time_s", "trip_time_min") + "T-01,2024-03-18,as-found,all,18,,3600,cold\n", 1, "trip_time_min", "unknown unit" },
        { "missing column", "asset_tag,tested_at,stage,current_a,trip_time_s,held_s,start\nT-01,2024-03-18,as-found,18,,3600,cold\n", 1, "pole", "required column pole" },
        { "column twice", TripHeader.TrimEnd() + ",trip_time_ms\nT-01,2024-03-18,as-found,all,18,,3600,cold,\n", 1, "trip_time_ms", "appears twice" },
        { "no unit", TripHeader.Replace("current_a", "current") + "T-01,2024-03-18,as-found,all,18,,3600,cold\n", 1, "current", "needs a unit suffix" },
        { "not a number", TripHeader + "T-01,2024-03-18,as-found,all,eighteen,,3600,cold\n", 2, "current_a", "not a number" },
        { "NaN", TripHeader + "T-01,2024-03-18,as-found,all,NaN,,3600,cold\n", 2, "current_a", "not a number" },
        { "infinite", TripHeader + "T-01,2024-03-18,as-found,all,Infinity,,3600,cold\n", 2, "current_a", "not a number" },
        { "negative", TripHeader + "T-01,2024-03-18,as-found,all,-18,,3600,cold\n", 2, "current_a", "above zero" },
        { "zero current", TripHeader + "T-01,2024-03-18,as-found,all,0,,3600,cold\n", 2, "current_a", "above zero" },
        { "absurd time", TripHeader + "T-01,2024-03-18,as-found,all,18,1e9,,cold\n", 2, "trip_time_s", "plausible range" },
        { "future date", TripHeader + "T-01,2027-01-05,as-found,all,18,,3600,cold\n", 2, "tested_at", "future" },
        { "bad date", TripHeader + "T-01,18/03/2024,as-found,all,18,,3600,cold\n", 2, "tested_at", "ISO 8601" },
        { "bad stage", TripHeader + "T-01,2024-03-18,before,all,18,,3600,cold\n", 2, "stage", "as-found or as-left" },
        { "bad pole", TripHeader + "T-01,2024-03-18,as-found,7,18,,3600,cold\n", 2, "pole", "1, 2, 3, 4, N or all" },
        { "no time", TripHeader + "T-01,2024-03-18,as-found,all,18,,,cold\n", 2, "held_s", "no trip time and no hold time" },
        { "both times", TripHeader + "T-01,2024-03-18,as-found,all,18,5,3600,cold\n", 2, "held_s", "did not trip" },
        { "short row", TripHeader + "T-01,2024-03-18,as-found,all,18\n", 2, "", "5 fields but the header has 8" },
        { "open quote", TripHeader + "T-01,2024-03-18,as-found,all,18,,3600,cold\n\"T-02,2024-03-18,as-found,all,18,,3600,cold\n", 3, "", "malformed" },
        { "semicolons", "asset_tag;tested_at;stage;pole;current_a;trip_time_s;held_s;start\nT-01;2024-03-18;as-found;all;18,2;;3600;cold\n", 1, "", "matches no record kind" },
    };

    [Theory]
    [MemberData(nameof(BadFiles))]
    public void BadInput_IsReportedWithLineColumnAndReason(string name, string content, long line, string column, string phrase)
    {
        using var temp = new TempFolder();
        var path = temp.Write(name.Replace(' ', '-') + ".csv", content);

        var parsed = RecordFileReader.Read(path, Records.Today);

        var problem = Assert.Single(parsed.Problems, p => p.Reason.Contains(phrase, StringComparison.OrdinalIgnoreCase));
        Assert.Equal((path, line, column), (problem.File, problem.Line, problem.Column));
    }

    [Fact]
    public void ABinaryFile_IsRefusedAsNotText()
    {
        using var temp = new TempFolder();
        var path = Path.Combine(temp.Path, "garbage.csv");
        File.WriteAllBytes(path, [0x50, 0x4B, 0x03, 0x04, 0x00, 0x00, 0xFF, 0x10]);

        var problem = Assert.Single(RecordFileReader.Read(path, Records.Today).Problems);

        Assert.Contains("not a text file", problem.Reason);
    }

    [Fact]
    public void ARowWithSeveralFaults_ReportsEachOfThem()
    {
        using var temp = new TempFolder();
        var path = temp.Write("many.csv", TripHeader + "T-01,2024-02-30,later,9,-1,,3600,hot\n");

        var parsed = RecordFileReader.Read(path, Records.Today);

        Assert.Equal(["tested_at", "stage", "pole", "current_a", "start"], parsed.Problems.Select(p => p.Column));
        Assert.Empty(parsed.Trips);
    }

    [Fact]
    public void AByteOrderMarkAndQuotedCommas_AreRead()
    {
        using var temp = new TempFolder();
        var path = Path.Combine(temp.Path, "bom.csv");
        File.WriteAllText(path, Records.Register.ReplaceLineEndings("\n"), new System.Text.UTF8Encoding(encoderShouldEmitUTF8Identifier: true));
        Assert.Equal(0xEF, File.ReadAllBytes(path)[0]);

        var parsed = RecordFileReader.Read(path, Records.Today);

        Assert.Empty(parsed.Problems);
        Assert.Equal(RecordKind.DeviceRegister, parsed.Kind);
        Assert.Equal("Board 1, way 1", parsed.Devices[0].Record.Location);
    }

    [Fact]
    public void HeaderNames_AreMatchedWithoutRegardToCaseOrSurroundingSpaces()
    {
        using var temp = new TempFolder();
        var path = temp.Write("caps.csv", " Asset_Tag ,TESTED_AT,Stage,Pole,Current_A,Trip_Time_MS,Held_S,Start\nT-01,2024-03-18,as-found,all,80,12,,cold\n");

        var parsed = RecordFileReader.Read(path, Records.Today);

        Assert.Empty(parsed.Problems);
        Assert.Equal(0.012, parsed.Trips[0].Record.Outcome.Time.Value, 12);
    }

    [Fact]
    public void AnInsulationFile_ReadsMohmAsMegohm_AndAContactFileAsMilliohm()
    {
        using var temp = new TempFolder();
        var insulation = RecordFileReader.Read(temp.Write("ir.csv", "asset_tag,tested_at,stage,path,test_voltage_v,resistance_mohm\nT-01,2024-03-18,as-found,1-E,500,250\n"), Records.Today);
        var contact = RecordFileReader.Read(temp.Write("cr.csv", "asset_tag,tested_at,stage,pole,resistance_mohm,test_current_a\nT-01,2024-03-18,as-found,1,0.25,10\n"), Records.Today);

        Assert.Equal(250.0, insulation.Insulations[0].Record.Resistance.Value.Value, 9);
        Assert.Equal(250.0, contact.Contacts[0].Record.Resistance.Value, 9);
    }
}
