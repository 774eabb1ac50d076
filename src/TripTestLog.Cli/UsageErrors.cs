using System.CommandLine;
using System.CommandLine.Parsing;
using TripTestLog.Application.Text;
using TripTestLog.Cli.Output;

namespace TripTestLog.Cli;

/// <summary>
/// Mistakes in the words typed, said in one sentence each on stderr instead of the help: an unknown option or command
/// with the nearest real one when it is close, otherwise a pointer to the command's help.
/// </summary>
internal static class UsageErrors
{
    /// <summary>The sentences for what is wrong with <paramref name="parse"/>; empty when the words are all understood.</summary>
    public static IReadOnlyList<string> Of(ParseResult parse)
    {
        var command = parse.CommandResult.Command;
        var help = $"{Path(parse.CommandResult)} --help";
        if (UnknownOption(parse, command) is { } option)
        {
            var near = Spelling.Nearest(option, Names(parse, command).Where(n => n.StartsWith("--", StringComparison.Ordinal)));
            return [near is null ? $"unknown option {option}; {help} lists the options" : $"unknown option {option}; did you mean {near}?"];
        }

        if (command.Subcommands.Count > 0 && parse.UnmatchedTokens.FirstOrDefault() is { } word)
        {
            var near = Spelling.Nearest(word, command.Subcommands.Select(c => c.Name));
            return [near is null ? $"unknown command {word}; {help} lists the commands" : $"unknown command {word}; did you mean {near}?"];
        }

        if (command.Subcommands.Count > 0 && command.Action is null && parse.Errors.Count > 0)
        {
            return [$"give a command; {help} lists them"];
        }

        if (parse.UnmatchedTokens.FirstOrDefault() is { } extra)
        {
            return [$"unexpected word {extra}; {help} shows the usage"];
        }

        // Anything else (a missing argument, a value that is not a number): System.CommandLine's own words, once each.
        return parse.Errors.Select(e => Plain(e.Message, command)).Distinct().Select(m => $"{m}; {help} shows the usage").ToList();
    }

    // System.CommandLine names .NET types ("System.Int32"); a person reads what kind of value is wanted.
    private static string Plain(string message, Command command)
    {
        var value = System.Text.RegularExpressions.Regex.Match(message, "^Cannot parse argument '(.*)' for option '(.*)' as expected type '(.*)'");
        if (value.Success)
        {
            var kind = value.Groups[3].Value switch
            {
                "System.Int32" or "System.Int64" => "a whole number",
                "System.Double" or "System.Decimal" => "a number",
                _ => "a valid value",
            };
            return $"{value.Groups[2].Value}: '{value.Groups[1].Value}' is not {kind}";
        }

        var missing = System.Text.RegularExpressions.Regex.Match(message, "^Required argument missing for command: '(.*)'");
        return missing.Success ? $"{missing.Groups[1].Value} needs its {string.Join(" and ", command.Arguments.Select(a => a.Name))} argument" : message.TrimEnd('.');
    }

    /// <summary>Writes each sentence as an error, wrapped at 100 columns.</summary>
    public static void Write(TextWriter error, IReadOnlyList<string> sentences)
    {
        foreach (var s in sentences)
        {
            Wrapped.Write(error, "error: " + s, 0, 2);
        }
    }

    // A word that looks like an option (a dash and a letter) but names none. Such a word may have been taken as a file or
    // other value; nothing runs, so a file named like an option is never opened by mistake.
    private static string? UnknownOption(ParseResult parse, Command command)
    {
        var known = Names(parse, command).ToHashSet(StringComparer.Ordinal);
        foreach (var token in parse.Tokens)
        {
            if (token.Type == TokenType.DoubleDash)
            {
                break;
            }

            var text = token.Value;
            if (token.Type != TokenType.Option && text.Length > 1 && text[0] == '-' && (char.IsLetter(text[1]) || (text.Length > 2 && text[1] == '-' && char.IsLetter(text[2])))
                && !known.Contains(text.Split('=', 2)[0]))
            {
                return text.Split('=', 2)[0];
            }
        }

        return null;
    }

    private static IEnumerable<string> Names(ParseResult parse, Command command)
    {
        var options = command.Options.AsEnumerable();
        for (var parent = parse.CommandResult.Parent as CommandResult; parent is not null; parent = parent.Parent as CommandResult)
        {
            options = options.Concat(parent.Command.Options.Where(o => o.Recursive));
        }

        return options.SelectMany(o => o.Aliases.Prepend(o.Name)).Where(n => n.StartsWith("--", StringComparison.Ordinal) || n.Length == 2);
    }

    private static string Path(CommandResult result)
    {
        var names = new List<string>();
        for (SymbolResult? r = result; r is CommandResult c; r = c.Parent)
        {
            names.Insert(0, c.Command.Name);
        }

        return string.Join(' ', names);
    }
}
