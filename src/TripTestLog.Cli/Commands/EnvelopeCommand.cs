using TripTestLog.Application.Stores;
using TripTestLog.Cli.Services;
using TripTestLog.Domain.Codes;
using System.CommandLine;
using TripTestLog.Cli.Output;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Application.Records;
using TripTestLog.Domain.Settings;
using TripTestLog.Ingest;

namespace TripTestLog.Cli.Commands;

/// <summary>`envelope`: the allowed trip-time band of a device type or of a registered device, as a table or CSV.</summary>
internal static class EnvelopeCommand
{
    public static Command Create(CliContext cli)
    {
        var o = new EnvelopeOptions();
        var command = new Command("envelope", "Show the trip-time band a device must meet, from its standard and settings, or of a registered device (--asset)");
        foreach (var option in o.All)
        {
            command.Add(option);
        }

        command.SetAction(parse => Run(cli, o.Read(parse)));
        return command;
    }

    private static int Run(CliContext cli, EnvelopeRequest request)
    {
        if (request.Family is not { } family)
        {
            return Usage(cli, $"--family: '{request.FamilyText}' is not a known family; use one of {string.Join(", ", FamilyCodes.All)}");
        }

        if (!TextCodes.Start.TryParse(request.Start, out var start))
        {
            return Usage(cli, $"--start: '{request.Start}' is not a start condition; use {TextCodes.Start.Choices}");
        }

        // An option that describes another family's device, or any device when --asset draws the register's, is refused
        // rather than ignored: the band drawn would not be the one asked for.
        var familyCode = FamilyCodes.Of(family);
        foreach (var given in request.Given)
        {
            if (!EnvelopeOptions.FamiliesOf.TryGetValue(given, out var families) && given != "--family")
            {
                continue;
            }

            if (request.Asset is not null)
            {
                return Usage(cli, $"{given}: --asset draws the device's band from its register settings; leave {given} out");
            }

            if (families is not null && !families.Contains(familyCode))
            {
                return Usage(cli, $"{given} does not apply to {familyCode}; it applies to {string.Join(", ", families)}");
            }
        }

        if (request.On is not null && request.Asset is null)
        {
            return Usage(cli, "--on applies with --asset: the date whose register settings to draw");
        }

        var conditions = new TestConditions(start, request.OnePole ? PoleLoading.OnePole : PoleLoading.AllPoles);
        ITripEnvelope envelope;
        string title;
        if (request.Asset is { } asset)
        {
            if (CommonOptions.Missing(cli, request.Database))
            {
                return ExitCodes.BadInput;
            }

            using var store = Stores.Open(cli, request.Database, StorePurpose.Read);
            // Only this device's register entries are read; a tag that cannot be one is not in the register.
            if (!AssetTag.IsValid(asset, out _) || !store.Histories(AssetTag.Of(asset)).TryGetValue(asset, out var history))
            {
                return Usage(cli, $"--asset: '{asset}' is not in the device register");
            }

            var device = history.Latest;
            if (request.On is { } onText)
            {
                if (!ConditionOptions.Date(onText, "--on", cli, out var on))
                {
                    return ExitCodes.BadInput;
                }

                device = history.InForceOn(on);
            }

            envelope = PointWindowEnvelope.Of(EnvelopeFactory.For(device, device.Settings, 1.0, store.CurveTables()));
            title = $"{device.Tag}: {FamilyCodes.Of(device.Family)}, In = {device.RatedCurrent}, {device.Settings.Summary} ({envelope.Standard})"
                + (request.On is { } shown ? $", settings in force on {shown}" : "");
        }
        else
        {
            var (settings, error) = SettingsFromOptions(request, cli.Today);
            if (settings is null)
            {
                return Usage(cli, error!);
            }

            // A relay's band rests on its pickup alone; the breaker's rating does not enter it.
            var rated = Amperes.Of(request.Rated ?? request.Pickup!.Value);
            if (request.Poles is { } n && n is < 1 or > 4)
            {
                return Usage(cli, "--poles: give 1 to 4");
            }

            var device = new Device(AssetTag.Of("envelope"), "", "", family, rated, request.Poles ?? 1, Volts.Of(400), null, null, "", "", "", settings.Value.Settings);
            envelope = PointWindowEnvelope.Of(EnvelopeFactory.For(device, device.Settings, 1.0, settings.Value.Tables));
            title = $"{FamilyCodes.Of(family)}, {(request.Rated is null ? "" : $"In = {rated}, ")}{device.Settings.Summary} ({envelope.Standard})";
        }

        if (request.Csv)
        {
            EnvelopeWriter.WriteCsv(Visible.Exact(cli.Out), envelope, conditions);
        }
        else
        {
            EnvelopeWriter.WriteTable(cli.Out, envelope, title, conditions);
        }

        return ExitCodes.Ok;
    }

    private static ((DeviceSettings Settings, IReadOnlyDictionary<string, CurveTable> Tables)? Value, string? Error) SettingsFromOptions(EnvelopeRequest r, DateOnly today)
    {
        if (r.Family != DeviceFamily.RelayIdmt && (r.Rated is not { } rated || !double.IsFinite(rated) || rated <= 0 || rated > 10_000))
        {
            return (null, "--rated: give the rated current In in amperes, e.g. --rated 16");
        }

        var noTables = new Dictionary<string, CurveTable>();
        switch (r.Family!.Value)
        {
            case DeviceFamily.Iec60898 or DeviceFamily.Iec61009:
                TripCurve? curve = r.Curve is { } ct && TextCodes.TripCurve.TryParse(ct, out var tc) ? tc : null;
                Supply? supply = r.Supply is null ? Supply.Ac : TextCodes.Supply.TryParse(r.Supply, out var sp) ? sp : null;
                if (supply is null || (supply == Supply.Dc && r.Family == DeviceFamily.Iec61009))
                {
                    return (null, "--supply: give ac or dc (dc for iec60898 only)");
                }

                if (supply == Supply.Dc && curve == TripCurve.D)
                {
                    return (null, "--curve: IEC 60898-2 admits only curves B and C for d.c.");
                }

                return curve is { } c ? ((new Iec60898Settings(c) { Supply = supply.Value }, noTables), null) : (null, "--curve: give B, C or D");

            case DeviceFamily.Iec60947Electronic:
                if (Positive(r.Ir) is not { } ir || Positive(r.Tr) is not { } tr)
                {
                    return (null, "--ir and --tr: give the long-time pickup in amperes and the delay in seconds");
                }

                if (Positive(r.Isd).HasValue != Positive(r.Tsd).HasValue)
                {
                    return (null, "--isd and --tsd: give both or neither");
                }

                return ((new ElectronicTripSettings(Amperes.Of(ir), Seconds.Of(tr), Positive(r.TrReference) ?? LabPolicy.TrReferenceMultiple,
                    A(r.Isd), S(r.Tsd), r.I2t, A(r.Ii), LabPolicy.ElectronicTimeTolerance, LabPolicy.InstantaneousMax) { ThermalMemory = r.ThermalMemory }, noTables), null);

            case DeviceFamily.Iec60947ThermalMagnetic:
                return Positive(r.Ir) is { } tir && Positive(r.Im) is { } im && im > tir
                    ? ((new ThermalMagneticSettings(Amperes.Of(tir), Amperes.Of(im), LabPolicy.InstantaneousMax), noTables), null)
                    : (null, "--ir and --im: give the thermal and magnetic settings in amperes, Im above Ir");

            case DeviceFamily.RelayIdmt:
                if (r.Curve is null || !CurveCodes.TryParse(r.Curve, out var idmt))
                {
                    return (null, $"--curve: give one of {string.Join(", ", CurveCodes.All)}");
                }

                if (Positive(r.Pickup) is not { } pickup || r.Tms is not (> 0 and <= 15))
                {
                    return (null, "--pickup and --tms: give the pickup in amperes and the time multiplier (0.01 to 15)");
                }

                return ((new RelaySettings(idmt, Amperes.Of(pickup), r.Tms.Value, A(r.HighSet), S(r.HighSetDelay), LabPolicy.RelayTimeTolerance,
                    LabPolicy.RelayPickupTolerance, Seconds.Of(Positive(r.OpeningTime) ?? 0)), noTables), null);

            default:
                if (r.Table is not { } file || !file.Exists)
                {
                    return (null, "--table: give a curve table CSV file (table,multiple,min_s,max_s)");
                }

                var parsed = RecordFileReader.Read(file.FullName, today);
                if (parsed.Problems.Count > 0 || parsed.Kind != RecordKind.CurveTable)
                {
                    return (null, parsed.Problems.Count > 0 ? parsed.Problems[0].ToString() : $"{file.Name} is not a curve table file");
                }

                var names = parsed.CurveTableRows.Select(x => x.Record.Table).Distinct(StringComparer.Ordinal).ToList();
                if (names.Count > 1)
                {
                    return (null, $"--table: {file.Name} holds {names.Count} tables ({string.Join(", ", names)}); give a file with the one table to draw");
                }

                var name = names[0];
                var table = CurveTable.Create(name, parsed.CurveTableRows.Where(x => x.Record.Table == name).Select(x => x.Record.Point).ToList());
                return ((new CurveTableSettings(name), new Dictionary<string, CurveTable> { [name] = table }), null);
        }
    }

    private static double? Positive(double? value) => value is { } v && double.IsFinite(v) && v > 0 ? v : null;

    private static Amperes? A(double? value) => Positive(value) is { } v ? Amperes.Of(v) : null;

    private static Seconds? S(double? value) => Positive(value) is { } v ? Seconds.Of(v) : null;

    private static int Usage(CliContext cli, string message)
    {
        cli.Error.WriteLine("error: " + message);
        return ExitCodes.BadInput;
    }
}
