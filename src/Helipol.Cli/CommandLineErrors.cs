using System.CommandLine;
using System.CommandLine.Completions;
using System.CommandLine.Help;
using System.CommandLine.Parsing;

namespace Helipol.Cli;

/// <summary>
/// Turns a command line that cannot be run into the project's one line:
/// <c>helipol VERB: --option: found ..., allowed ...</c>, or <c>helipol: found unknown verb ...</c>.
/// It reads only the parse tree and the declared symbols (name, arity, value type, choices,
/// description), never the parser's own message text, so an option added to any verb later is
/// covered with no code here. A validator or custom parser that adds an error already in the
/// "found ..., allowed ..." form has it printed as written, after the verb (and the option
/// name when the text starts with "found").
/// </summary>
public static class CommandLineErrors
{
    /// <summary>The one error line for <paramref name="parsed"/>, or null when the command line can run.</summary>
    public static string? Describe(RootCommand root, ParseResult parsed)
    {
        // Help shows whatever else is on the line, as the parser intends.
        if (root.Options.OfType<HelpOption>().Any(h => parsed.GetResult(h) is not null)) return null;
        var command = parsed.CommandResult;
        if (command.Command == root) return DescribeRoot(root, parsed);

        var verb = "helipol " + string.Join(' ', Path(command).Select(c => c.Name));
        var problem = UnknownOption(parsed, command);
        if (problem is null && parsed.Errors.Count > 0)
            problem = parsed.Errors.Select(e => Describe(e, parsed, command)).FirstOrDefault(p => p is not null)
                ?? CommandProblem(parsed, command)
                ?? $"found a command line it cannot read, allowed the forms '{verb} --help' lists";
        return problem is null ? null : $"{verb}: {problem}";
    }

    private static string? DescribeRoot(RootCommand root, ParseResult parsed)
    {
        var verbs = root.Subcommands.Where(c => !c.Hidden).Select(c => c.Name).ToList();
        var first = FreeTokens(parsed, null).FirstOrDefault();
        if (first is null)
            return parsed.Errors.Count == 0 ? null : $"helipol: found no verb, allowed {Either(verbs)}";
        if (LooksLikeOption(first.Value))
        {
            var name = OptionPart(first.Value);
            var known = KnownOptions(root, null);
            return Suggestion.Closest(name, known.SelectMany(o => o.Aliases.Prepend(o.Name))) is { } near
                ? $"helipol: found unknown option '{name}' (did you mean '{near}'?)"
                : $"helipol: found unknown option '{name}', allowed a verb ({Either(verbs)}), {Either(known.Select(o => o.Name))}";
        }
        return Suggestion.Closest(first.Value, verbs) is { } verb
            ? $"helipol: found unknown verb '{first.Value}' (did you mean '{verb}'?)"
            : $"helipol: found unknown verb '{first.Value}', allowed {Either(verbs)}";
    }

    /// <summary>
    /// A word written like an option that no option takes. The parser would hand it to a file
    /// argument (<c>sweep -x</c>) or leave it unmatched; either way the user meant an option.
    /// </summary>
    private static string? UnknownOption(ParseResult parsed, CommandResult command)
    {
        var token = FreeTokens(parsed, command).FirstOrDefault(t => LooksLikeOption(t.Value));
        if (token is null) return null;
        var name = OptionPart(token.Value);
        var known = KnownOptions(command.Command, command);
        return Suggestion.Closest(name, known.SelectMany(o => o.Aliases.Prepend(o.Name))) is { } near
            ? $"found unknown option '{name}' (did you mean '{near}'?)"
            : $"found unknown option '{name}', allowed {Either(known.Select(o => o.Name))}";
    }

    private static string? Describe(ParseError error, ParseResult parsed, CommandResult command) => error.SymbolResult switch
    {
        OptionResult o => OptionProblem(o.Option, o, error.Message),
        ArgumentResult { Parent: OptionResult o } => OptionProblem(o.Option, o, error.Message),
        ArgumentResult a => ArgumentProblem(a.Argument, a, error.Message),
        _ => Own(error.Message, null) ?? CommandProblem(parsed, command),
    };

    private static string OptionProblem(Option option, OptionResult result, string message)
    {
        if (Own(message, option.Name) is { } own) return own;
        var tokens = result.Tokens;
        var choices = Choices(option.GetCompletions(CompletionContext.Empty));
        var allowed = Allowed(option.ValueType, choices, option.Description);
        if (result.IdentifierTokenCount == 0)
            return $"{option.Name}: found nothing, allowed {allowed} (required)";
        if (tokens.Count == 0)
            return option.Arity.MinimumNumberOfValues > 0 ? $"{option.Name}: found no value, allowed {allowed}" : $"{option.Name}: found a problem with it, allowed {allowed}";
        if (tokens.Count > option.Arity.MaximumNumberOfValues)
            return $"{option.Name}: found {tokens.Count} values ({Quoted(tokens)}), allowed {Count(option.Arity.MaximumNumberOfValues, "value")}";
        return $"{option.Name}: found '{Bad(tokens, choices).Value}', allowed {allowed}";
    }

    private static string ArgumentProblem(Argument argument, ArgumentResult result, string message)
    {
        if (Own(message, argument.Name) is { } own) return own;
        var choices = Choices(argument.GetCompletions(CompletionContext.Empty));
        var allowed = Allowed(argument.ValueType, choices, argument.Description);
        var tokens = result.Tokens;
        if (tokens.Count < argument.Arity.MinimumNumberOfValues) return $"{argument.Name}: found nothing, allowed {allowed}";
        if (tokens.Count > argument.Arity.MaximumNumberOfValues)
            return $"found an extra argument '{tokens[argument.Arity.MaximumNumberOfValues].Value}', allowed {Count(argument.Arity.MaximumNumberOfValues, argument.Name)}";
        return $"{argument.Name}: found '{Bad(tokens, choices).Value}', allowed {allowed}";
    }

    /// <summary>What a command as a whole lacks or has too much of: a missing argument or required option, or an extra word.</summary>
    private static string? CommandProblem(ParseResult parsed, CommandResult command)
    {
        foreach (var argument in command.Command.Arguments)
        {
            var result = command.Children.OfType<ArgumentResult>().FirstOrDefault(r => r.Argument == argument);
            if ((result?.Tokens.Count ?? 0) < argument.Arity.MinimumNumberOfValues)
                return $"{argument.Name}: found nothing, allowed {Allowed(argument.ValueType, Choices(argument.GetCompletions(CompletionContext.Empty)), argument.Description)}";
        }
        foreach (var option in command.Command.Options.Where(o => o.Required))
            if (!command.Children.OfType<OptionResult>().Any(r => r.Option == option && !r.Implicit))
                return $"{option.Name}: found nothing, allowed {Allowed(option.ValueType, Choices(option.GetCompletions(CompletionContext.Empty)), option.Description)} (required)";
        if (parsed.UnmatchedTokens.Count > 0)
        {
            var names = command.Command.Arguments.Where(a => !a.Hidden).Select(a => a.Arity.MaximumNumberOfValues > 1 ? a.Name + "..." : a.Name).ToList();
            return $"found an extra argument '{parsed.UnmatchedTokens[0]}', allowed {(names.Count == 0 ? "no arguments" : "only " + string.Join(" and ", names))}";
        }
        return null;
    }

    /// <summary>A message a validator wrote in the project's form, with the symbol's name put in front when it starts at "found".</summary>
    private static string? Own(string message, string? name)
    {
        if (!message.Contains("found ", StringComparison.Ordinal) || !message.Contains(", allowed ", StringComparison.Ordinal)) return null;
        return message.StartsWith("found ", StringComparison.Ordinal) && name is not null ? $"{name}: {message}" : message;
    }

    /// <summary>What a value may be, said in words: the choices, the kind of number, or the symbol's own description.</summary>
    private static string Allowed(Type valueType, IReadOnlyList<string> choices, string? description)
    {
        if (choices.Count > 0) return Either(choices);
        var type = valueType.IsArray ? valueType.GetElementType()! : valueType;
        type = Nullable.GetUnderlyingType(type) ?? type;
        if (type == typeof(int) || type == typeof(long) || type == typeof(short) || type == typeof(uint) || type == typeof(ulong) || type == typeof(byte))
            return "a whole number";
        if (type == typeof(double) || type == typeof(float) || type == typeof(decimal)) return "a number";
        if (type == typeof(bool)) return "true or false";
        // The first clause of the description names the thing ("design file (.yaml)").
        var first = description?.Split("; ")[0].Trim();
        return string.IsNullOrEmpty(first) ? "a value" : first;
    }

    private static IReadOnlyList<string> Choices(IEnumerable<CompletionItem> items) => items.Select(i => i.Label).Distinct().ToList();

    private static Token Bad(IReadOnlyList<Token> tokens, IReadOnlyList<string> choices) =>
        tokens.FirstOrDefault(t => choices.Count > 0 && !choices.Contains(t.Value)) ?? tokens[^1];

    /// <summary>The words after <paramref name="command"/>'s name (or every word) that no option took, up to a lone "--".</summary>
    private static IEnumerable<Token> FreeTokens(ParseResult parsed, CommandResult? command)
    {
        var optionValues = new HashSet<Token>(ReferenceEqualityComparer.Instance);
        for (SymbolResult? r = command ?? parsed.RootCommandResult; r is CommandResult c; r = c.Parent)
            foreach (var o in c.Children.OfType<OptionResult>())
                foreach (var t in o.Tokens) optionValues.Add(t);
        bool started = command is null;
        foreach (var token in parsed.Tokens)
        {
            if (token.Type == TokenType.DoubleDash) yield break;
            if (!started) { started = ReferenceEquals(token, command!.IdentifierToken); continue; }
            if (token.Type == TokenType.Argument && !optionValues.Contains(token)) yield return token;
        }
    }

    /// <summary>The options valid after <paramref name="command"/>: its own and the recursive ones of the commands above it.</summary>
    private static IReadOnlyList<Option> KnownOptions(Command command, CommandResult? result)
    {
        var options = command.Options.Where(o => !o.Hidden).ToList();
        for (var parent = result?.Parent as CommandResult; parent is not null; parent = parent.Parent as CommandResult)
            options.AddRange(parent.Command.Options.Where(o => o.Recursive && !o.Hidden));
        return options;
    }

    private static IEnumerable<Command> Path(CommandResult command)
    {
        var path = new List<Command>();
        for (CommandResult? c = command; c?.Parent is CommandResult parent; c = parent) path.Insert(0, c.Command);
        return path;
    }

    /// <summary>A word that starts with a dash and is not a negative number (<c>-10deg</c> is a value).</summary>
    private static bool LooksLikeOption(string word) => word.Length > 1 && word[0] == '-' && !char.IsAsciiDigit(word[1]) && word[1] != '.';

    private static string OptionPart(string word) => word.Split('=', ':')[0];

    private static string Quoted(IEnumerable<Token> tokens) => string.Join(", ", tokens.Select(t => $"'{t.Value}'"));

    private static string Count(int n, string noun) => n switch
    {
        0 => $"no {noun}s",
        1 => $"one {noun}",
        _ => $"{n} {noun}s",
    };

    private static string Either(IEnumerable<string> words)
    {
        var list = words.ToList();
        return list.Count <= 1 ? string.Concat(list) : string.Join(", ", list.Take(list.Count - 1)) + " or " + list[^1];
    }
}
