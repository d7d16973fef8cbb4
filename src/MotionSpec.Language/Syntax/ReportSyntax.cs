using MotionSpec.Language.Text;

namespace MotionSpec.Language.Syntax;

/// <summary><c>report tip in quay via trolley basis boom as tipLoad</c>; via, basis and as are optional.</summary>
internal sealed class ReportSyntax(
    TextSpan span,
    IdentifierSyntax subject,
    IdentifierSyntax observer,
    IdentifierSyntax? via,
    IdentifierSyntax? basis,
    IdentifierSyntax? alias) : StatementSyntax(span)
{
    /// <summary>The point or frame followed.</summary>
    public IdentifierSyntax Subject { get; } = subject;

    /// <summary>The frame it is seen from.</summary>
    public IdentifierSyntax Observer { get; } = observer;

    /// <summary>The moving frame of the five terms, when written.</summary>
    public IdentifierSyntax? Via { get; } = via;

    /// <summary>The basis of the vectors, when written.</summary>
    public IdentifierSyntax? Basis { get; } = basis;

    /// <summary>The report's name, when written.</summary>
    public IdentifierSyntax? Alias { get; } = alias;

    /// <inheritdoc/>
    public override string ToString() =>
        "report " + Subject + " in " + Observer
        + (Via is null ? string.Empty : " via " + Via)
        + (Basis is null ? string.Empty : " basis " + Basis)
        + (Alias is null ? string.Empty : " as " + Alias);
}
