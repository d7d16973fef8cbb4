using MotionSpec.Language.Text;

namespace MotionSpec.Language.Binding.Symbols;

/// <summary>A declared name: param, coord, let, frame, point or report. All share one namespace.</summary>
public abstract class Symbol(string name, TextSpan nameSpan, TextSpan statementSpan)
{
    /// <summary>The name as declared.</summary>
    public string Name { get; } = name;

    /// <summary>Where the name is written in its declaration.</summary>
    public TextSpan NameSpan { get; } = nameSpan;

    /// <summary>The whole declaring statement.</summary>
    public TextSpan StatementSpan { get; } = statementSpan;

    /// <summary>What kind of thing this names, in words ("param", "frame"...), for messages.</summary>
    public abstract string KindName { get; }

    /// <inheritdoc/>
    public override string ToString() => Name;
}
