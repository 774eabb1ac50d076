using TripTestLog.Application.Records;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Application.Import;

/// <summary>The rules a register file must meet as a whole.</summary>
internal static class RegisterRules
{
    /// <summary>
    /// Several entries for one device are its settings history, told apart by settings_from; two different entries
    /// with the same date cannot both be right.
    /// </summary>
    public static List<RowProblem> Conflicts(ParsedFile file)
    {
        var first = new Dictionary<(AssetTag, DateOnly?), Located<Device>>();
        var problems = new List<RowProblem>();
        foreach (var row in file.Devices)
        {
            var key = (row.Record.Tag, row.Record.SettingsFrom);
            if (!first.TryAdd(key, row) && first[key].Record != row.Record)
            {
                problems.Add(ImportProblems.SameDateTwice(file.Path, row.Line, row.Record.Tag, first[key].Line));
            }
        }

        return problems;
    }
}
