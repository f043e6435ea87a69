using System.Globalization;

namespace FilterQA.Cli.Arguments;

/// <summary>
/// A command's arguments split into positionals, flags and (possibly repeated) options.
/// Options are written <c>--name value</c> or <c>--name=value</c>; <c>--</c> ends option parsing.
/// Every option a command does not declare is a usage error, so a typo never passes silently.
/// </summary>
public sealed class ParsedArguments
{
    private readonly Dictionary<string, List<string>> _options;
    private readonly HashSet<string> _flags;

    private ParsedArguments(List<string> positionals, Dictionary<string, List<string>> options, HashSet<string> flags)
    {
        Positionals = positionals;
        _options = options;
        _flags = flags;
    }

    /// <summary>Arguments that are not options, in order.</summary>
    public IReadOnlyList<string> Positionals { get; }

    /// <summary>Splits <paramref name="args"/> given the options that take a value and the flags that do not.</summary>
    /// <exception cref="UsageException">An undeclared option, a flag given a value, or an option missing its value.</exception>
    public static ParsedArguments Parse(IReadOnlyList<string> args, IReadOnlyCollection<string> valueOptions, IReadOnlyCollection<string> flagOptions)
    {
        var positionals = new List<string>();
        var options = new Dictionary<string, List<string>>(StringComparer.Ordinal);
        var flags = new HashSet<string>(StringComparer.Ordinal);
        bool onlyPositionals = false;
        for (int i = 0; i < args.Count; i++)
        {
            string arg = args[i];
            if (onlyPositionals || !arg.StartsWith("--", StringComparison.Ordinal))
            {
                positionals.Add(arg);
                continue;
            }
            if (arg == "--")
            {
                onlyPositionals = true;
                continue;
            }
            string name = arg;
            string? inlineValue = null;
            int equals = arg.IndexOf('=', StringComparison.Ordinal);
            if (equals > 0)
            {
                name = arg[..equals];
                inlineValue = arg[(equals + 1)..];
            }
            if (flagOptions.Contains(name))
            {
                if (inlineValue is not null)
                {
                    throw new UsageException($"{name} takes no value");
                }
                flags.Add(name);
            }
            else if (valueOptions.Contains(name))
            {
                string value = inlineValue ?? (i + 1 < args.Count ? args[++i] : throw new UsageException($"{name} needs a value"));
                if (!options.TryGetValue(name, out List<string>? list))
                {
                    options[name] = list = [];
                }
                list.Add(value);
            }
            else
            {
                throw new UsageException($"unknown option {name}");
            }
        }
        return new ParsedArguments(positionals, options, flags);
    }

    /// <summary>True when the flag was given.</summary>
    public bool Has(string flag) => _flags.Contains(flag);

    /// <summary>Every value given for a repeatable option, in order.</summary>
    public IReadOnlyList<string> All(string option) => _options.TryGetValue(option, out List<string>? list) ? list : [];

    /// <summary>The value of an option that may be given once, or null.</summary>
    /// <exception cref="UsageException">Given more than once.</exception>
    public string? Single(string option)
    {
        IReadOnlyList<string> values = All(option);
        return values.Count switch
        {
            0 => null,
            1 => values[0],
            _ => throw new UsageException($"{option} may be given only once"),
        };
    }

    /// <summary>Parses a list of positive numbers written <c>3,6,20</c>.</summary>
    /// <exception cref="UsageException">Empty, or an item that is not a finite positive number.</exception>
    public static IReadOnlyList<double> PositiveNumberList(string option, string text)
    {
        string[] items = text.Split(',', StringSplitOptions.TrimEntries);
        var values = new List<double>(items.Length);
        foreach (string item in items)
        {
            if (!double.TryParse(item, NumberStyles.Float, CultureInfo.InvariantCulture, out double value) || !double.IsFinite(value) || value <= 0)
            {
                throw new UsageException($"{option}: '{item}' is not a positive number (write e.g. 3,6,20)");
            }
            values.Add(value);
        }
        return values;
    }

    /// <summary>Parses a band written <c>startHz:stopHz</c> (plain numbers in hertz, start not above stop).</summary>
    /// <exception cref="UsageException">Not two finite non-negative numbers separated by a colon, or start above stop.</exception>
    public static (double StartHz, double StopHz) Band(string option, string text)
    {
        string[] parts = text.Split(':', StringSplitOptions.TrimEntries);
        if (parts.Length != 2
            || !double.TryParse(parts[0], NumberStyles.Float, CultureInfo.InvariantCulture, out double start)
            || !double.TryParse(parts[1], NumberStyles.Float, CultureInfo.InvariantCulture, out double stop)
            || !double.IsFinite(start) || !double.IsFinite(stop) || start < 0)
        {
            throw new UsageException($"{option}: '{text}' is not a band; write <startHz>:<stopHz>, e.g. 445000:465000");
        }
        if (start > stop)
        {
            throw new UsageException($"{option}: band start {start.ToString("R", CultureInfo.InvariantCulture)} Hz is above its stop {stop.ToString("R", CultureInfo.InvariantCulture)} Hz");
        }
        return (start, stop);
    }
}
