using System.Diagnostics;
using System.Globalization;
using System.Text.Json;
using TripTestLog.Application.Check;
using TripTestLog.Application.Findings;
using TripTestLog.Application.Import;
using TripTestLog.Cli.Output;
using TripTestLog.Ingest;
using TripTestLog.Application.Stores;
using TripTestLog.Storage;
using TripTestLog.Storage.Postgres;

namespace TripTestLog.Benchmarks;

/// <summary>
/// The benchmark: for each fleet size it writes an invented fleet, then times in separate child processes (so each
/// step's peak memory is its own) the raw SQLite insert floor, the project's import, a re-import, the peer places an
/// import through the command keeps (findings and reports read them), the raw read floor and
/// check with JSON output, and prints rows per second, the ratios to the floors and peak memory.
/// Usage: dotnet run -c Release --project tests/TripTestLog.Benchmarks -- [--rows 100000,300000,1000000] [--devices 10000] [--files 20] [--work DIR]
/// [--server CONNECTION]. With --server (a PostgreSQL connection string; the password from PGPASSWORD or a .pgpass file),
/// the same fleet is also imported into, checked and judged on the server, against the server's own COPY and read floors.
/// With --pairs N, only the import against the insert floor at the largest --rows, N times alternated, and the median ratio.
/// Diagnostic steps, run one at a time on a fleet written with --step generate: --step NAME --work DIR, where NAME is
/// floor-schema (the raw insert into the project's own table), parse-only, rows-only, open-only, read-only, judge-only, and on the
/// server (with --server) server-floor-staged, server-floor-staged-indexes and server-floor-staged-keys (the COPY floor
/// through a staging table, then into a table with the device and file ids and their indexes, then with foreign keys too).
/// With --one-device DB --asset TAG [--runs 10] [--before TOOL], the one-device commands as processes against a bare --version
/// (OneDevice); --tool names the triptestlog to time (default: the build beside the benchmark, e.g. an installed tool
/// instead), --before an earlier build's to time beside it in the same run.
/// </summary>
internal static class Program
{
    private static string? server;

    private static readonly string[] Steps = ["floor-insert", "import", "reimport", "places", "floor-read", "check", "findings", "fleet-page", "report", "pages", "full-report"];

    private static readonly string[] ServerSteps = ["server-floor-insert", "server-import", "server-floor-read", "server-check", "server-findings"];

    private static int Main(string[] args)
    {
        try
        {
            var options = Options.Parse(args);
            if (options.Step == "generate")
            {
                BenchmarkFleet.Write(Path.Combine(options.Work, "records"), options.Devices, options.Rows[0], options.Files);
                return 0;
            }

            server = options.Server;
            if (options.OneDevice is { } database)
            {
                return OneDevice.Run(database, options.Asset ?? throw new ArgumentException("--one-device needs --asset TAG"), options.Runs, options.Before, options.Tool);
            }

            return options.Step is { } step ? RunStep(step, options.Work) : options.Pairs > 0 ? RunPairs(options) : RunAll(options);
        }
        catch (ArgumentException e)
        {
            Console.Error.WriteLine("error: " + e.Message);
            return 2;
        }
    }

    private static int RunAll(Options o)
    {
        Console.WriteLine($"TripTestLog benchmark, {Environment.ProcessorCount} cores, {DateTime.UtcNow:yyyy-MM-dd}; {o.Devices} devices, {o.Files} files");
        Console.WriteLine();
        Console.WriteLine("    rows  step           seconds      rows/s   x floor  peak MB");
        Console.WriteLine("--------  ------------  --------  ----------  --------  -------");
        var perRow = new List<(long Rows, double ImportSeconds, double CheckSeconds)>();
        foreach (var rows in o.Rows)
        {
            var work = Path.Combine(o.Work, $"n{rows}");
            if (Directory.Exists(work))
            {
                Directory.Delete(work, recursive: true);
            }

            Console.Error.WriteLine($"writing a fleet of {rows:N0} trip rows in {work} ...");
            BenchmarkFleet.Write(Path.Combine(work, "records"), o.Devices, rows, o.Files);
            var results = new Dictionary<string, StepResult>();
            foreach (var step in Steps)
            {
                Console.Error.WriteLine($"  {step} ...");
                results[step] = Child(step, work);
                if (results[step].Rows != rows && step is not "reimport" and not "places" and not "findings" and not "fleet-page" and not "report" and not "pages" and not "full-report")
                {
                    throw new InvalidOperationException($"{step} handled {results[step].Rows} rows, not {rows}");
                }
            }

            Print(rows, "floor-insert", results["floor-insert"], null);
            Print(rows, "import", results["import"], results["floor-insert"]);
            Print(rows, "reimport", results["reimport"], results["floor-insert"]);
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"{rows,8}  {"places",-12}  {results["places"].Seconds,8:0.00}  {results["places"].Rows} devices placed among their peers, as import does ({results["places"].PeakMb:0} MB peak)"));
            Print(rows, "floor-read", results["floor-read"], null);
            Print(rows, "check --json", results["check"], results["floor-read"], slower: true);
            Print(rows, "findings", results["findings"], results["floor-read"], slower: true);
            Print(rows, "fleet-page", results["fleet-page"], results["check"], slower: true);
            Print(rows, "report", results["report"], results["check"], slower: true);
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"{rows,8}  device pages: {results["pages"].Rows} written in {results["pages"].Seconds:0.00} s, {results["pages"].Rows / results["pages"].Seconds:0} pages/s ({results["pages"].PeakMb:0} MB peak)"));
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"{rows,8}  full report: {results["full-report"].Rows} device pages, data files and fleet page in {results["full-report"].Seconds:0.00} s ({results["full-report"].PeakMb:0} MB peak)"));
            if (o.Server is { } connection)
            {
                ServerFloors.Reset(connection);
                foreach (var step in ServerSteps)
                {
                    Console.Error.WriteLine($"  {step} ...");
                    results[step] = Child(step, work);
                }

                Print(rows, "pg floor-ins", results["server-floor-insert"], null);
                Print(rows, "pg import", results["server-import"], results["server-floor-insert"]);
                Print(rows, "pg floor-read", results["server-floor-read"], null);
                Print(rows, "pg check", results["server-check"], results["server-floor-read"], slower: true);
                Print(rows, "pg findings", results["server-findings"], results["server-floor-read"], slower: true);
                Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
                    $"{rows,8}  server against SQLite on this machine: import x{results["import"].Seconds / results["server-import"].Seconds:0.00} the speed, "
                    + $"check x{results["check"].Seconds / results["server-check"].Seconds:0.00}, findings x{results["findings"].Seconds / results["server-findings"].Seconds:0.00}"));
            }

            perRow.Add((rows, results["import"].Seconds, results["check"].Seconds));
            Directory.Delete(work, recursive: true);
        }

        if (perRow.Count > 1)
        {
            var (r0, i0, c0) = perRow[0];
            var (r1, i1, c1) = perRow[^1];
            Console.WriteLine();
            Console.WriteLine($"Growth from {r0:N0} to {r1:N0} rows ({(double)r1 / r0:0.#}x): import time x{i1 / i0:0.##}, check time x{c1 / c0:0.##}.");
        }

        Console.WriteLine("x floor: for import and re-import, rows/s over the insert floor's (higher is better); for check and findings,");
        Console.WriteLine("time over the read floor's (lower is better); for fleet-page and report, time over check's. fleet-page: the");
        Console.WriteLine("fleet page alone; report: the fleet page with the findings and verdicts as CSV and JSON beside it.");
        if (o.Server is not null)
        {
            Console.WriteLine("pg: the same steps on the PostgreSQL server, against its own floors: binary COPY of the raw rows into a plain");
            Console.WriteLine("table with a unique 16-byte key, and one ordered read of the stored rows written as JSON lines.");
        }

        return 0;
    }

    // The import against the insert floor, alternated so that both see the same state of a shared machine, then the median
    // ratio: on a virtual machine whose speed drifts between runs, one pair says less than several.
    private static int RunPairs(Options o)
    {
        var rows = o.Rows[^1];
        var work = Path.Combine(o.Work, $"pairs{rows}");
        if (Directory.Exists(work))
        {
            Directory.Delete(work, recursive: true);
        }

        Console.Error.WriteLine($"writing a fleet of {rows:N0} trip rows in {work} ...");
        BenchmarkFleet.Write(Path.Combine(work, "records"), o.Devices, rows, o.Files);
        Console.WriteLine($"TripTestLog import against the insert floor, {rows:N0} rows, {o.Pairs} alternated pairs, {Environment.ProcessorCount} cores, {DateTime.UtcNow:yyyy-MM-dd}");
        Console.WriteLine("pair  floor s  import s  x floor");
        var ratios = new List<double>();
        for (var i = 1; i <= o.Pairs; i++)
        {
            foreach (var stale in Directory.GetFiles(work, "*.db*"))
            {
                File.Delete(stale);
            }

            var floor = Child("floor-insert", work);
            var import = Child("import", work);
            ratios.Add(floor.Seconds / import.Seconds);
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"{i,4}  {floor.Seconds,7:0.00}  {import.Seconds,8:0.00}  {ratios[^1],7:0.00}"));
        }

        ratios.Sort();
        var median = ratios.Count % 2 == 1 ? ratios[ratios.Count / 2] : (ratios[ratios.Count / 2 - 1] + ratios[ratios.Count / 2]) / 2;
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"median x floor {median:0.00} (lowest {ratios[0]:0.00}, highest {ratios[^1]:0.00})"));
        Directory.Delete(work, recursive: true);
        return 0;
    }

    private static void Print(long rows, string step, StepResult r, StepResult? floor, bool slower = false)
    {
        var ratio = floor is null ? "" : slower ? (r.Seconds / floor.Seconds).ToString("0.00", CultureInfo.InvariantCulture)
            : (rows / r.Seconds / (rows / floor.Seconds)).ToString("0.00", CultureInfo.InvariantCulture);
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"{rows,8}  {step,-12}  {r.Seconds,8:0.00}  {rows / r.Seconds,10:0}  {ratio,8}  {r.PeakMb,7:0}"));
    }

    private static StepResult Child(string step, string work)
    {
        var info = new ProcessStartInfo(Environment.ProcessPath!) { RedirectStandardOutput = true, UseShellExecute = false };
        foreach (var a in new[] { "--step", step, "--work", work })
        {
            info.ArgumentList.Add(a);
        }

        if (server is not null)
        {
            info.ArgumentList.Add("--server");
            info.ArgumentList.Add(server);
        }

        using var process = Process.Start(info)!;
        var output = process.StandardOutput.ReadToEnd();
        process.WaitForExit();
        if (process.ExitCode != 0)
        {
            throw new InvalidOperationException($"step {step} failed with exit code {process.ExitCode}");
        }

        return JsonSerializer.Deserialize<StepResult>(output)!;
    }

    private static int RunStep(string step, string work)
    {
        var records = Path.Combine(work, "records");
        var trips = Directory.GetFiles(records, "trips-*.csv").Order(StringComparer.Ordinal).ToList();
        var project = Path.Combine(work, "project.db");
        var now = DateTimeOffset.UtcNow;
        var today = DateOnly.FromDateTime(DateTime.UtcNow);
        var clock = Stopwatch.StartNew();
        long rows;
        switch (step)
        {
            case "floor-insert":
                rows = Floors.Insert(Path.Combine(work, "floor.db"), trips);
                break;
            case "import":
            case "reimport":
                using (var store = RecordStore.Open(project))
                {
                    var pipeline = new ImportPipeline(store);
                    if (step == "import")
                    {
                        pipeline.Import(new CsvRecordFileSource(Path.Combine(records, "register.csv"), ReadOptions.Default), ImportOptions.Strict, today, now);
                        clock.Restart();
                    }

                    rows = 0;
                    foreach (var outcome in pipeline.Run(trips.Select(t => (IRecordFileSource)new CsvRecordFileSource(t, ReadOptions.Default)).ToList(), ImportOptions.Strict, today, () => now))
                    {
                        rows += outcome.Status == ImportStatus.Imported ? outcome.Added : outcome.RowsRead;
                    }
                }

                break;
            case "places":
                // What an import through the command does after its files: each device's place among its peers, which
                // findings and reports then read instead of a pass over the fleet.
                using (var store = RecordStore.Open(project))
                {
                    rows = StoredPeerPositions.Refresh(store, store, FindingPolicy.Default);
                }

                break;
            case "floor-schema":
                var schemaDb = Path.Combine(work, "schema-floor.db");
                using (var store = RecordStore.Open(schemaDb))
                {
                    new ImportPipeline(store).Import(new CsvRecordFileSource(Path.Combine(records, "register.csv"), ReadOptions.Default), ImportOptions.Strict, today, now);
                }

                clock.Restart();
                rows = Floors.InsertIntoProjectSchema(schemaDb, trips);
                break;
            case "parse-only":
                rows = 0;
                foreach (var t in trips)
                {
                    using var file = new CsvRecordFileSource(t, ReadOptions.Default).Open(today);
                    foreach (var row in file.Rows())
                    {
                        rows += row.Record is null ? 0 : 1;
                    }
                }

                break;
            case "rows-only":
                rows = 0;
                foreach (var t in trips)
                {
                    using var file = new CsvRecordFileSource(t, ReadOptions.Default).Open(today);
                    foreach (var row in file.Rows())
                    {
                        rows += MeasurementTable.RowOf((Application.Records.MeasurementRecord)row.Record!, 1, row.Line).Fingerprint.Length > 0 ? 1 : 0;
                    }
                }

                break;
            case "open-only":
                using (var store = RecordStore.Open(project))
                {
                    rows = 0;
                }

                break;
            case "read-only":
                using (var store = RecordStore.Open(project))
                {
                    rows = store.Devices().Sum(d => (long)d.Trips.Count);
                }

                break;
            case "judge-only":
                using (var store = RecordStore.Open(project))
                {
                    rows = CheckPipeline.Run(store).LongCount();
                }

                break;
            case "floor-read":
                rows = Floors.ReadAsJson(project, Path.Combine(work, "floor.jsonl"));
                break;
            case "server-floor-insert":
                rows = ServerFloors.Insert(Server(), trips);
                break;
            case "server-floor-staged":
                rows = ServerFloors.Insert(Server(), trips, ServerFloors.Way.Staged);
                break;
            case "server-floor-staged-indexes":
                rows = ServerFloors.Insert(Server(), trips, ServerFloors.Way.StagedWithIndexes);
                break;
            case "server-floor-staged-keys":
                rows = ServerFloors.Insert(Server(), trips, ServerFloors.Way.StagedWithKeys);
                break;
            case "server-floor-read":
                rows = ServerFloors.ReadAsJson(Server(), Path.Combine(work, "server-floor.jsonl"));
                break;
            case "server-import":
                using (var store = ServerStore())
                {
                    var pipeline = new ImportPipeline(store);
                    pipeline.Import(new CsvRecordFileSource(Path.Combine(records, "register.csv"), ReadOptions.Default), ImportOptions.Strict, today, now);
                    clock.Restart();
                    rows = 0;
                    foreach (var outcome in pipeline.Run(trips.Select(t => (IRecordFileSource)new CsvRecordFileSource(t, ReadOptions.Default)).ToList(), ImportOptions.Strict, today, () => now))
                    {
                        rows += outcome.Status == ImportStatus.Imported ? outcome.Added : outcome.RowsRead;
                    }
                }

                break;
            case "server-check":
                using (var store = ServerStore())
                {
                    rows = WriteVerdicts(store, Path.Combine(work, "server-check.json"));
                }

                break;
            case "server-findings":
                using (var store = ServerStore())
                {
                    rows = WriteFindings(store, Path.Combine(work, "server-findings.json"), today);
                }

                break;
            case "check":
                using (var store = RecordStore.Open(project))
                {
                    rows = WriteVerdicts(store, Path.Combine(work, "check.json"));
                }

                break;
            case "fleet-page":
                // The fleet page alone: both passes of the findings and the page, no device pages, no data files.
                using (var store = RecordStore.Open(project))
                {
                    var context = new TripTestLog.Reports.ReportContext(project, "benchmark", today, DateTimeOffset.UtcNow, FindingPolicy.Default, "defaults", store.Instruments());
                    var writer = new TripTestLog.Reports.ReportWriter(Path.Combine(work, step), context, devicePages: false);
                    foreach (var device in FindingsPipeline.RunWithRecords(store, FindingPolicy.Default, today))
                    {
                        writer.Add(device);
                    }

                    writer.Finish();
                    rows = 1;
                }

                break;
            case "full-report":
                using (var store = RecordStore.Open(project))
                {
                    var context = new TripTestLog.Reports.ReportContext(project, "benchmark", today, DateTimeOffset.UtcNow, FindingPolicy.Default, "defaults", store.Instruments());
                    var (_, pages) = TripTestLog.Cli.Services.ReportRun.WriteAsync(store, Path.Combine(work, step), context,
                        TripTestLog.Application.Reports.ReportSelection.All, default).GetAwaiter().GetResult();
                    rows = pages;
                }

                break;
            case "report":
            case "pages":
                // report: the fleet page and the data files beside it (device pages off); x floor is its time over
                // check's. pages: from the first device out of the pipeline to the last of the first 500 devices' pages
                // written. full-report: report as the command runs it, every device page and the data files.
                using (var store = RecordStore.Open(project))
                {
                    var folder = Path.Combine(work, step);
                    var context = new TripTestLog.Reports.ReportContext(project, "benchmark", today, DateTimeOffset.UtcNow, FindingPolicy.Default, "defaults", store.Instruments());
                    if (step == "report")
                    {
                        TripTestLog.Cli.Services.ReportRun.WriteAsync(store, folder, context, TripTestLog.Application.Reports.ReportSelection.All with { DevicePages = false }, default)
                            .GetAwaiter().GetResult();
                        rows = 1;
                    }
                    else
                    {
                        // Judging and pages together, as report runs them: the page writers work beside the pipeline.
                        using var writer = new TripTestLog.Reports.ReportWriter(folder, context, devicePages: true);
                        // The clock starts at the first device, after the pipeline's first pass over the whole fleet.
                        var pageClock = new Stopwatch();
                        rows = 0;
                        foreach (var device in FindingsPipeline.RunWithRecords(store, FindingPolicy.Default, today).Take(500))
                        {
                            pageClock.Start();
                            writer.Add(device);
                            rows++;
                        }

                        writer.Finish();
                        pageClock.Stop();
                        Console.WriteLine(JsonSerializer.Serialize(new StepResult(pageClock.Elapsed.TotalSeconds, rows, Process.GetCurrentProcess().PeakWorkingSet64 / 1048576.0)));
                        return 0;
                    }
                }

                break;
            case "findings":
                // Both passes of the findings pipeline over every device, every finding written as JSON; rows here are
                // the devices, the trip rows they rest on are the fleet's.
                using (var store = RecordStore.Open(project))
                {
                    rows = WriteFindings(store, Path.Combine(work, "findings.json"), today);
                }

                break;
            default:
                throw new ArgumentException($"unknown step '{step}'");
        }

        var seconds = clock.Elapsed.TotalSeconds;
        Console.WriteLine(JsonSerializer.Serialize(new StepResult(seconds, rows, Process.GetCurrentProcess().PeakWorkingSet64 / 1048576.0)
        {
            AllocatedMb = GC.GetTotalAllocatedBytes() / 1048576.0,
            GcPauseSeconds = GC.GetTotalPauseDuration().TotalSeconds,
            Gen0Collections = GC.CollectionCount(0),
            Gen2Collections = GC.CollectionCount(2),
        }));
        return 0;
    }

    private static string Server() => server ?? throw new ArgumentException("the server steps need --server CONNECTION");

    private static IRecordStore ServerStore() =>
        PostgresRecordStore.Open(ServerAddress.Parse(ServerFloors.In(Server(), ServerFloors.ProjectSchema), fromCommandLine: false));

    // check --json's work: every trip judged with its history and written as a JSON object.
    private static long WriteVerdicts(IRecordStore store, string path)
    {
        using var writer = new StreamWriter(path, false, new System.Text.UTF8Encoding(false), 1 << 16);
        var json = new VerdictJson(writer);
        long rows = 0;
        foreach (var judged in CheckPipeline.Run(store))
        {
            json.Add(judged);
            rows++;
        }

        json.Finish();
        return rows;
    }

    // Both passes of the findings pipeline over every device, every finding written as JSON; rows are the devices.
    private static long WriteFindings(IRecordStore store, string path, DateOnly today)
    {
        using var writer = new StreamWriter(path, false, new System.Text.UTF8Encoding(false), 1 << 16);
        using var json = new FindingJson(writer);
        long rows = 0;
        foreach (var device in FindingsPipeline.Run(store, FindingPolicy.Default, today))
        {
            json.Add(device, device.Findings);
            rows++;
        }

        json.Finish();
        return rows;
    }

    // What a step allocated and how long the collector paused it: where a step's time goes when it is not in its own code.
    private sealed record StepResult(double Seconds, long Rows, double PeakMb)
    {
        public double AllocatedMb { get; init; }

        public double GcPauseSeconds { get; init; }

        public int Gen0Collections { get; init; }

        public int Gen2Collections { get; init; }
    }

    private sealed record Options(IReadOnlyList<long> Rows, int Devices, int Files, string Work, string? Step, int Pairs = 0, string? Server = null)
    {
        public string? OneDevice { get; init; }

        public string? Asset { get; init; }

        public int Runs { get; init; } = 10;

        public string? Before { get; init; }

        public string? Tool { get; init; }

        public static Options Parse(string[] args)
        {
            var rows = new List<long> { 100_000, 300_000, 1_000_000 };
            int devices = 10_000, files = 20;
            var work = Path.Combine(Path.GetTempPath(), "triptestlog-bench");
            string? step = null;
            var pairs = 0;
            string? server = null;
            string? oneDevice = null, asset = null;
            var runs = 10;
            string? before = null, tool = null;
            for (var i = 0; i < args.Length; i++)
            {
                var value = i + 1 < args.Length ? args[i + 1] : throw new ArgumentException($"{args[i]} needs a value");
                switch (args[i])
                {
                    case "--rows":
                        rows = value.Split(',').Select(v => long.TryParse(v, out var n) && n > 0 ? n : throw new ArgumentException($"--rows: '{v}' is not a positive whole number")).ToList();
                        break;
                    case "--devices":
                        devices = int.TryParse(value, out var d) && d > 0 ? d : throw new ArgumentException("--devices takes a positive whole number");
                        break;
                    case "--files":
                        files = int.TryParse(value, out var f) && f > 0 ? f : throw new ArgumentException("--files takes a positive whole number");
                        break;
                    case "--work":
                        work = value;
                        break;
                    case "--step":
                        step = value;
                        break;
                    case "--server":
                        server = value;
                        break;
                    case "--pairs":
                        pairs = int.TryParse(value, out var n2) && n2 is > 0 and <= 20 ? n2 : throw new ArgumentException("--pairs takes a whole number from 1 to 20");
                        break;
                    case "--one-device":
                        oneDevice = value;
                        break;
                    case "--asset":
                        asset = value;
                        break;
                    case "--tool":
                        tool = value;
                        break;
                    case "--before":
                        before = value;
                        break;
                    case "--runs":
                        runs = int.TryParse(value, out var r) && r is > 0 and <= 100 ? r : throw new ArgumentException("--runs takes a whole number from 1 to 100");
                        break;
                    default:
                        throw new ArgumentException($"unknown option {args[i]}; use --rows, --devices, --files, --work, --pairs, --server, --one-device, --asset, --runs, --before, --tool");
                }

                i++;
            }

            return new Options(rows, devices, files, work, step, pairs, server) { OneDevice = oneDevice, Asset = asset, Runs = runs, Before = before, Tool = tool };
        }
    }
}
