using YamlDotNet.Core;
using YamlDotNet.Core.Events;

namespace Readiness.Core.Configuration;

/// <summary>
/// Reads a small YAML document into <see cref="ConfigNode"/>s with positions. Bounded: aliases and anchors are
/// refused (no expansion attacks), nesting depth and node count are capped, duplicate keys are errors.
/// </summary>
public static class YamlReader
{
    public const int MaxDepth = 32;
    public const int MaxNodes = 20_000;
    public const int MaxChars = 1024 * 1024;

    /// <summary>Parses one document; an empty document gives an empty mapping.</summary>
    public static ConfigNode Read(string file, string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        if (text.Length > MaxChars)
        {
            throw new ConfigurationException(new ConfigMark(file, 1, 1), $"the file is larger than {MaxChars:N0} characters");
        }

        var parser = new Parser(new StringReader(text));
        var state = new State(file, parser);
        try
        {
            state.Expect<StreamStart>();
            if (parser.Accept<StreamEnd>(out _))
            {
                return new ConfigMap([], new ConfigMark(file, 1, 1));
            }

            state.Expect<DocumentStart>();
            var root = parser.Accept<DocumentEnd>(out _)
                ? new ConfigMap([], new ConfigMark(file, 1, 1))
                : state.ReadNode(0);
            state.Expect<DocumentEnd>();
            if (!parser.Accept<StreamEnd>(out _))
            {
                throw new ConfigurationException(state.MarkOf(parser.Current), "only one YAML document is allowed");
            }

            return root;
        }
        catch (YamlException e)
        {
            throw new ConfigurationException(new ConfigMark(file, (int)e.Start.Line, (int)e.Start.Column), "invalid YAML: " + e.Message);
        }
    }

    private sealed class State(string file, Parser parser)
    {
        private int nodes;

        public ConfigMark MarkOf(ParsingEvent? e) =>
            e is null ? new ConfigMark(file, 1, 1) : new ConfigMark(file, (int)e.Start.Line, (int)e.Start.Column);

        public T Expect<T>()
            where T : ParsingEvent
        {
            if (parser.Current is null && !parser.MoveNext())
            {
                throw new ConfigurationException(new ConfigMark(file, 1, 1), "unexpected end of file");
            }

            if (parser.Current is not T t)
            {
                throw new ConfigurationException(MarkOf(parser.Current), $"unexpected {parser.Current?.GetType().Name}");
            }

            parser.MoveNext();
            return t;
        }

        public ConfigNode ReadNode(int depth)
        {
            if (depth > MaxDepth)
            {
                throw new ConfigurationException(MarkOf(parser.Current), $"nesting deeper than {MaxDepth} levels");
            }

            if (++nodes > MaxNodes)
            {
                throw new ConfigurationException(MarkOf(parser.Current), $"more than {MaxNodes:N0} values");
            }

            var current = parser.Current;
            var mark = MarkOf(current);
            switch (current)
            {
                case AnchorAlias:
                    throw new ConfigurationException(mark, "YAML aliases (*name) are not allowed");
                case NodeEvent { Anchor.IsEmpty: false }:
                    throw new ConfigurationException(mark, "YAML anchors (&name) are not allowed");
                case Scalar scalar:
                    parser.MoveNext();
                    return new ConfigScalar(scalar.Value, mark);
                case SequenceStart:
                    parser.MoveNext();
                    var items = new List<ConfigNode>();
                    while (!parser.Accept<SequenceEnd>(out _))
                    {
                        items.Add(ReadNode(depth + 1));
                    }

                    parser.MoveNext();
                    return new ConfigList(items, mark);
                case MappingStart:
                    parser.MoveNext();
                    var entries = new List<ConfigEntry>();
                    while (!parser.Accept<MappingEnd>(out _))
                    {
                        var keyMark = MarkOf(parser.Current);
                        if (ReadNode(depth + 1) is not ConfigScalar key)
                        {
                            throw new ConfigurationException(keyMark, "mapping keys must be plain values");
                        }

                        if (key.Value == "<<")
                        {
                            throw new ConfigurationException(keyMark, "YAML merge keys (<<) are not allowed");
                        }

                        if (entries.Any(e => e.Key == key.Value))
                        {
                            throw new ConfigurationException(keyMark, $"duplicate key '{ConfigQuote.Of(key.Value)}'");
                        }

                        entries.Add(new ConfigEntry(key.Value, keyMark, ReadNode(depth + 1)));
                    }

                    parser.MoveNext();
                    return new ConfigMap(entries, mark);
                default:
                    throw new ConfigurationException(mark, $"unexpected {current?.GetType().Name ?? "end of file"}");
            }
        }
    }
}
