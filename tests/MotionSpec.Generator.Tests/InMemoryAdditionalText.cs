using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Text;

namespace MotionSpec.Generator.Tests;

/// <summary>An AdditionalFiles item that exists only in memory.</summary>
internal sealed class InMemoryAdditionalText(string path, string text) : AdditionalText
{
    public override string Path { get; } = path;

    public override SourceText GetText(CancellationToken cancellationToken = default) => SourceText.From(text);
}
