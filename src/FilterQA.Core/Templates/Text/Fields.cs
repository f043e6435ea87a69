using System.Globalization;
using YamlDotNet.RepresentationModel;

namespace FilterQA.Core.Templates.Text;

/// <summary>
/// The fields of one YAML mapping while a template is read: looks values up by key, converts them, and
/// reports every problem (with its position) to the session instead of stopping at the first.
/// </summary>
internal sealed class Fields
{
    private readonly TemplateTextSession _session;
    private readonly YamlMappingNode _node;
    private readonly string _prefix;
    private readonly Dictionary<string, (YamlScalarNode Key, YamlNode Value)> _byKey = new(StringComparer.Ordinal);

    internal Fields(TemplateTextSession session, YamlMappingNode node, string context, string prefix)
    {
        _session = session;
        _node = node;
        _prefix = prefix;
        Context = context;
        foreach (KeyValuePair<YamlNode, YamlNode> pair in node.Children)
        {
            if (pair.Key is not YamlScalarNode key || key.Value is null)
            {
                session.Report(pair.Key, $"a field name in {context} must be a plain word");
                continue;
            }
            _byKey[key.Value] = (key, pair.Value);
            session.Place(prefix + key.Value, pair.Value);
        }
    }

    /// <summary>How messages name this mapping ("the sweep section", "rule 'ripple'").</summary>
    internal string Context { get; set; }

    /// <summary>Reports every field not in <paramref name="allowed"/>.</summary>
    internal void RejectUnknown(IReadOnlyList<string> allowed)
    {
        foreach ((string name, (YamlScalarNode key, _)) in _byKey)
        {
            if (!allowed.Contains(name, StringComparer.Ordinal))
            {
                _session.Report(key, $"unknown field '{name}' in {Context}; expected one of: {string.Join(", ", allowed)}");
            }
        }
    }

    /// <summary>True when the field is written (even if empty).</summary>
    internal bool Has(string key) => _byKey.ContainsKey(key);

    /// <summary>The value node of a field, or null when absent.</summary>
    internal YamlNode? Node(string key) => _byKey.TryGetValue(key, out var field) ? field.Value : null;

    /// <summary>Reports a problem at a field's value (or at the mapping when the field is absent).</summary>
    internal void Report(string key, string message) => _session.Report(Node(key) ?? _node, message);

    /// <summary>The text of a single-value field; null (and a problem when required) when absent, empty or not a single value.</summary>
    internal string? Text(string key, bool required)
    {
        if (!_byKey.TryGetValue(key, out var field))
        {
            if (required)
            {
                _session.Report(_node, $"{Context} has no '{key}'; it is required");
            }
            return null;
        }
        if (field.Value is not YamlScalarNode scalar)
        {
            _session.Report(field.Value, $"'{key}' in {Context} must be a single value, not a {(field.Value is YamlSequenceNode ? "list" : "mapping")}");
            return null;
        }
        string value = scalar.Value ?? "";
        bool isNull = scalar.Style == YamlDotNet.Core.ScalarStyle.Plain && value is "" or "~" or "null";
        if (isNull)
        {
            _session.Report(field.Value, $"'{key}' in {Context} has no value");
            return null;
        }
        return value;
    }

    /// <summary>A quantity of <paramref name="kind"/> in SI units, with its sign checked.</summary>
    internal double? Quantity(string key, QuantityKind kind, bool required, Sign sign, FrequencyAnchor? anchor = null)
    {
        string? text = Text(key, required);
        if (text is null)
        {
            return null;
        }
        if (!Quantities.TryRead(text, kind, out double value, out bool isPpm, out string? error))
        {
            if (isPpm && anchor == FrequencyAnchor.Absolute)
            {
                error = $"'{text}' is in ppm, a relative unit, but this rule's frequencies are absolute (anchor: absolute); write the frequency in Hz, kHz, MHz or GHz";
            }
            Report(key, $"'{key}': {error}");
            return null;
        }
        return CheckSign(key, text, value, sign);
    }

    /// <summary>A frequency tolerance (Hz family or ppm).</summary>
    internal FrequencyTolerance? Tolerance(string key)
    {
        string? text = Text(key, required: true);
        if (text is null)
        {
            return null;
        }
        if (!Quantities.TryReadTolerance(text, out double value, out ToleranceUnit unit, out string? error))
        {
            Report(key, $"'{key}': {error}");
            return null;
        }
        return CheckSign(key, text, value, Sign.Positive) is null ? null : new FrequencyTolerance(value, unit);
    }

    /// <summary>An uncertainty stated in the unit family of a tolerance (Hz family for Hz, ppm for ppm).</summary>
    internal double? ToleranceUncertainty(string key, FrequencyTolerance? tolerance)
    {
        string? text = Text(key, required: true);
        if (text is null)
        {
            return null;
        }
        if (!Quantities.TryReadTolerance(text, out double value, out ToleranceUnit unit, out string? error))
        {
            Report(key, $"'{key}': {error}");
            return null;
        }
        if (tolerance is not null && unit != tolerance.Unit)
        {
            Report(key, $"'{key}' is in {Say(unit)} but the tolerance is in {Say(tolerance.Unit)}; state both in the same unit");
            return null;
        }
        return CheckSign(key, text, value, Sign.NonNegative);
    }

    /// <summary>A file word of <typeparamref name="T"/>.</summary>
    internal T? Word<T>(string key, bool required, string what) where T : struct, Enum
    {
        string? text = Text(key, required);
        if (text is null)
        {
            return null;
        }
        if (!Words.TryRead(text, out T value))
        {
            Report(key, $"unknown {what} '{text}'; expected one of: {string.Join(", ", Words.All<T>())}");
            return null;
        }
        return value;
    }

    /// <summary>A whole number of at least <paramref name="minimum"/>.</summary>
    internal int? Integer(string key, bool required, int minimum)
    {
        string? text = Text(key, required);
        if (text is null)
        {
            return null;
        }
        if (!int.TryParse(text, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out int value))
        {
            Report(key, $"'{key}' must be a whole number; got '{text}'");
            return null;
        }
        if (value < minimum)
        {
            Report(key, string.Create(CultureInfo.InvariantCulture, $"'{key}' must be at least {minimum}; got {value}"));
            return null;
        }
        return value;
    }

    /// <summary>true or false.</summary>
    internal bool? Bool(string key, bool required)
    {
        string? text = Text(key, required);
        if (text is null)
        {
            return null;
        }
        if (text is not ("true" or "false"))
        {
            Report(key, $"'{key}' must be true or false; got '{text}'");
            return null;
        }
        return text == "true";
    }

    /// <summary>A calendar date written yyyy-mm-dd.</summary>
    internal DateOnly? Date(string key, bool required)
    {
        string? text = Text(key, required);
        if (text is null)
        {
            return null;
        }
        if (!DateOnly.TryParseExact(text, "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out DateOnly date))
        {
            Report(key, $"'{key}' must be a date written year-month-day, e.g. 2025-10-20; got '{text}'");
            return null;
        }
        return date;
    }

    /// <summary>A nested mapping.</summary>
    internal YamlMappingNode? Mapping(string key, bool required)
    {
        YamlNode? node = Node(key);
        if (node is null)
        {
            if (required)
            {
                _session.Report(_node, $"{Context} has no '{key}' section; it is required");
            }
            return null;
        }
        if (node is not YamlMappingNode mapping)
        {
            _session.Report(node, $"'{key}' in {Context} must be a section of fields");
            return null;
        }
        return mapping;
    }

    /// <summary>A nested list.</summary>
    internal YamlSequenceNode? Sequence(string key, bool required)
    {
        YamlNode? node = Node(key);
        if (node is null)
        {
            if (required)
            {
                _session.Report(_node, $"{Context} has no '{key}' list; it is required");
            }
            return null;
        }
        if (node is not YamlSequenceNode sequence)
        {
            _session.Report(node, $"'{key}' in {Context} must be a list (lines starting with '- ')");
            return null;
        }
        return sequence;
    }

    /// <summary>Runs a model constructor; an <see cref="ArgumentException"/> becomes a problem at <paramref name="key"/>.</summary>
    internal T? Make<T>(string key, Func<T> make) where T : class
    {
        try
        {
            return make();
        }
        catch (ArgumentException problem)
        {
            Report(key, problem.Message);
            return null;
        }
    }

    private double? CheckSign(string key, string text, double value, Sign sign)
    {
        if (sign == Sign.Positive && value <= 0)
        {
            Report(key, $"'{key}' must be above zero; got '{text}'");
            return null;
        }
        if (sign == Sign.NonNegative && value < 0)
        {
            Report(key, $"'{key}' must not be negative; got '{text}'");
            return null;
        }
        return value;
    }

    private static string Say(ToleranceUnit unit) => unit == ToleranceUnit.Hertz ? "Hz" : "ppm";
}
