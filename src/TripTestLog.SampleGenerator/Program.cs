using TripTestLog.SampleGenerator;

// Writes the invented demo fleet's record files; the same output every run (fixed seed).
var folder = args.Length > 0 ? args[0] : "sample-records";
var files = SampleFleet.WriteTo(folder);
Console.WriteLine($"wrote {files.Count} files to {Path.GetFullPath(folder)}");
return 0;
