using YamlDotNet.Core;
using YamlDotNet.Core.Events;

namespace CellCheck.IO.Design;

/// <summary>
/// Passes YAML parser events through while enforcing the limits of a safe design file: nesting at most
/// <see cref="MaxDepth"/> deep (the tree loader recurses per level), at most <see cref="MaxAliases"/> aliases, at most
/// <see cref="MaxExpandedNodes"/> nodes once every alias is expanded (a few nested anchors can otherwise stand for
/// billions of nodes), no alias to an anchor not yet complete (a cycle), and one document. When a limit is passed it
/// throws a <see cref="YamlException"/> at the offending event and sets <see cref="Code"/> to the problem code.
/// </summary>
internal sealed class GuardedParser(IParser inner) : IParser
{
    public const int MaxDepth = 64;
    public const int MaxAliases = 100;
    public const int MaxExpandedNodes = 100_000;

    private readonly Dictionary<string, long> _sizes = new(StringComparer.Ordinal);
    private readonly Stack<(string? Anchor, long Count)> _open = new();
    private int _aliases;
    private int _documents;
    private long _expanded;

    /// <summary>The problem code of the limit that stopped parsing, or null.</summary>
    public string? Code { get; private set; }

    public ParsingEvent? Current => inner.Current;

    public bool MoveNext()
    {
        if (!inner.MoveNext())
        {
            return false;
        }

        switch (inner.Current)
        {
            case DocumentStart start:
                if (++_documents > 1)
                {
                    Stop(ProblemCodes.MultipleDocuments, start, "The file holds more than one YAML document (a second '---').");
                }

                break;
            case NodeEvent { } node and (MappingStart or SequenceStart):
                if (_open.Count >= MaxDepth)
                {
                    Stop(ProblemCodes.TooDeep, node, $"Lists and mappings are nested more than {MaxDepth} levels deep.");
                }

                Expand(1, node);
                _open.Push((node.Anchor.IsEmpty ? null : node.Anchor.Value, 1));
                break;
            case MappingEnd or SequenceEnd:
                var (anchor, count) = _open.Pop();
                AddToParent(count);
                if (anchor is not null)
                {
                    _sizes[anchor] = count;
                }

                break;
            case AnchorAlias alias:
                Alias(alias);
                break;
            case Scalar scalar:
                Expand(1, scalar);
                AddToParent(1);
                if (!scalar.Anchor.IsEmpty)
                {
                    _sizes[scalar.Anchor.Value] = 1;
                }

                break;
        }

        return true;
    }

    private void Alias(AnchorAlias alias)
    {
        if (++_aliases > MaxAliases)
        {
            Stop(ProblemCodes.AliasLimit, alias, $"The file uses more than {MaxAliases} aliases (*name).");
        }

        if (!_sizes.TryGetValue(alias.Value.Value, out var size))
        {
            Stop(_open.Any(o => o.Anchor == alias.Value.Value) ? ProblemCodes.AliasLimit : ProblemCodes.YamlSyntax, alias,
                _open.Any(o => o.Anchor == alias.Value.Value)
                    ? $"The alias *{alias.Value.Value} refers to the list or mapping it is inside (a cycle)."
                    : $"The alias *{alias.Value.Value} refers to no anchor &{alias.Value.Value} written before it.");
        }

        Expand(size, alias);
        AddToParent(size);
    }

    private void Expand(long nodes, ParsingEvent at)
    {
        _expanded += nodes;
        if (_expanded > MaxExpandedNodes)
        {
            Stop(ProblemCodes.AliasLimit, at, "Once its aliases are expanded the file stands for more than 100 000 values.");
        }
    }

    private void AddToParent(long nodes)
    {
        if (_open.Count > 0)
        {
            var (anchor, count) = _open.Pop();
            _open.Push((anchor, count + nodes));
        }
    }

    private void Stop(string code, ParsingEvent at, string message)
    {
        Code = code;
        throw new YamlException(at.Start, at.End, message);
    }
}
