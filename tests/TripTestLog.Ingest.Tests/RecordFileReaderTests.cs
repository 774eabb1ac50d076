using TripTestLog.Application.Records;

namespace TripTestLog.Ingest.Tests;

/// <summary>Bad input yields a problem naming the line, the column and what to fix, and never a record.</summary>
public sealed class RecordFileReaderTests
{
    private const string TripHeader = "asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start\n";

    private static string Corpus => Path.Combine(AppContext.BaseDirectory, "bad-input");

    /// <summary>The bad-input corpus: each file in bad-input/ with the line, column and reason cases.txt expects.</summary>
    public static TheoryData<string, long, string, string> BadFiles()
    {
        var data = new TheoryData<string, long, string, string>();
        foreach (var line in File.ReadAllLines(Path.Combine(Corpus, "cases.txt")).Where(l => l.Length > 0 && l[0] != '#'))
        {
            var f = line.Split('|');
            data.Add(f[0], long.Parse(f[1], System.Globalization.CultureInfo.InvariantCulture), f[2], f[3]);
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(BadFiles))]
    public void EveryFileOfTheBadInputCorpus_IsReportedWithLineColumnAndReason(string file, long line, string column, string phrase)
    {
        var path = Path.Combine(Corpus, file);

        var parsed = RecordFileReader.Read(path, Records.Today);

        var problem = Assert.Single(parsed.Problems, p => p.Reason.Contains(phrase, StringComparison.OrdinalIgnoreCase));
        Assert.Equal((path, line, column), (problem.File, problem.Line, problem.Column));
        Assert.DoesNotContain(line, parsed.RecordLines);
    }

    [Fact]
    public void TheCorpusIndex_CoversEveryCorpusFile()
    {
        var indexed = BadFiles().Select(row => (string)row[0]).ToHashSet();
        var files = Directory.GetFiles(Corpus, "*.csv").Select(Path.GetFileName).ToHashSet();

        Assert.Equal(files.Order(), indexed.Order());
    }

    [Fact]
    public void AFileOverTheSizeLimit_IsRefusedBeforeItIsRead_SayingHowToProceed()
    {
        using var temp = new TempFolder();
        var path = Path.Combine(temp.Path, "huge.csv");
        using (var stream = File.Create(path))
        {
            // 200 MB, written sparse: the limit is checked before any byte is read.
            stream.SetLength(200L * 1024 * 1024);
        }

        var parsed = RecordFileReader.Read(path, Records.Today, ReadOptions.Default with { MaxBytes = 100L * 1024 * 1024 });

        var problem = Assert.Single(parsed.Problems);
        Assert.Contains("200 MB, over the 100 MB limit", problem.Reason);
        Assert.Contains("--max-file-mb", problem.Reason);
        Assert.True(parsed.IsUnreadable);
    }

    [Fact]
    public void ASemicolonFileWithDecimalCommas_IsReadWhenItsHeaderIsUnambiguous()
    {
        using var temp = new TempFolder();
        var path = temp.Write("semi.csv", "asset_tag;tested_at;stage;pole;current_a;trip_time_s;held_s;start\nT-01;2024-03-18;as-found;all;40,8;22,5;;cold\n");

        var parsed = RecordFileReader.Read(path, Records.Today);

        Assert.Empty(parsed.Problems);
        Assert.Equal((40.8, 22.5), (parsed.Trips[0].Record.Current.Value, parsed.Trips[0].Record.Outcome.Time.Value));
    }

    [Fact]
    public void ADeclaredSeparatorAndDecimalMark_AreUsed()
    {
        using var temp = new TempFolder();
        var path = temp.Write("tab.csv", "asset_tag|tested_at|stage|pole|current_a|trip_time_s|held_s|start\nT-01|2024-03-18|as-found|all|40,8|22,5||cold\n");

        var parsed = RecordFileReader.Read(path, Records.Today, new ReadOptions { Separator = '|', Decimal = ',' });

        Assert.Empty(parsed.Problems);
        Assert.Equal(40.8, parsed.Trips[0].Record.Current.Value, 9);
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
