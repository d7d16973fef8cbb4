using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary><c>frame quay</c>, <c>frame boom in quay { rotate about z by yaw }</c>: a root or child frame.</summary>
internal sealed class FrameSyntax(TextSpan span, IdentifierSyntax name, IdentifierSyntax? parent, IReadOnlyList<FrameItemSyntax>? block)
    : StatementSyntax(span)
{
    /// <summary>The declared name.</summary>
    public IdentifierSyntax Name { get; } = name;

    /// <summary>The parent after <c>in</c>; null for a root.</summary>
    public IdentifierSyntax? Parent { get; } = parent;

    /// <summary>The statements of the block, or null when no block is written.</summary>
    public IReadOnlyList<FrameItemSyntax>? Block { get; } = block;

    /// <inheritdoc/>
    public override string ToString()
    {
        var header = "frame " + Name + (Parent is null ? string.Empty : " in " + Parent);
        if (Block is null)
        {
            return header;
        }

        return Block.Count == 0 ? header + " {\n}" : header + " {\n" + string.Concat(Block.Select(item => "    " + item + "\n")) + "}";
    }
}
