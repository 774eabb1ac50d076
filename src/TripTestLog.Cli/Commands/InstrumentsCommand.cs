using TripTestLog.Application.Stores;
using TripTestLog.Cli.Services;
using System.CommandLine;
using System.Globalization;
using TripTestLog.Cli.Output;
using TripTestLog.Domain.Instruments;

namespace TripTestLog.Cli.Commands;

/// <summary>`instruments`: each registered instrument's calibration and where it stands on a date.</summary>
internal static class InstrumentsCommand
{
    /// <summary>A calibration due within this many days is called out (lab practice, so the next one can be booked).</summary>
    public const int DueSoonDays = 30;

    public static Command Create(CliContext cli)
    {
        var db = CommonOptions.ExistingDatabase();
        var asOf = new Option<string?>("--as-of") { Description = "The state on this date (default: today)", HelpName = "YYYY-MM-DD" };
        var command = new Command("instruments", "List the registered instruments: their calibration and whether it holds today") { db, asOf };
        command.SetAction(parse =>
        {
            var date = cli.Today;
            if (!ConditionOptions.AsOfDate(parse.GetValue(asOf), date, cli, out date))
            {
                return ExitCodes.BadInput;
            }

            var file = parse.GetValue(db)!;
            if (CommonOptions.Missing(cli, file))
            {
                return ExitCodes.BadInput;
            }

            using var store = Stores.Open(cli, file, StorePurpose.Read);
            var register = store.Instruments();
            var table = new TextTable(
                TextColumn.Left("Instrument"), TextColumn.Left("Kind"), TextColumn.Left("Serial"), TextColumn.Left("Calibrated"), TextColumn.Left("Due"),
                TextColumn.Left("State", shortening: Shortening.End));
            var lapsed = 0;
            foreach (var name in register.Instruments)
            {
                var state = register.StateOn(name, date);
                var p = state.Period!;
                lapsed += state.State == CalibrationState.Lapsed ? 1 : 0;
                table.Add(name, p.Kind, p.Serial, Day(p.CalibratedOn), Day(p.CalibrationDue), state.State switch
                {
                    CalibrationState.InCalibration when state.Days <= DueSoonDays => $"in calibration, due in {state.Days} days",
                    CalibrationState.InCalibration => "in calibration",
                    CalibrationState.Lapsed => $"LAPSED {state.Days} days ago",
                    _ => $"not yet calibrated (from {Day(p.CalibratedOn)})",
                });
            }

            cli.Out.WriteLine($"Instruments on {Day(date)}:");
            table.WriteTo(cli.Out);
            cli.Out.WriteLine();
            cli.Out.WriteLine(lapsed == 0 ? "No instrument's calibration has lapsed." : $"{lapsed} instrument{(lapsed == 1 ? " is" : "s are")} out of calibration: tests made with {(lapsed == 1 ? "it" : "them")} cannot be traced.");
            return ExitCodes.Ok;
        });
        return command;
    }

    private static string Day(DateOnly d) => d.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture);
}
