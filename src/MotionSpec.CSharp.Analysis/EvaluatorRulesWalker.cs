using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Operations;

namespace MotionSpec.CSharp.Analysis;

/// <summary>
/// Walks a generated file twice over: its syntax for loops, jumps and constructs that have no business in an
/// evaluator, and the compiler's operation tree of every piece of executable code for what the syntax hides
/// (a <c>new</c> of a class, a boxing conversion, the target of each call). It also counts each method's
/// arithmetic, so the cost of an evaluator is a number the compiler itself vouches for.
/// </summary>
internal sealed class EvaluatorRulesWalker(SemanticModel model) : CSharpSyntaxWalker
{
    private readonly List<EmittedCodeFinding> _findings = [];
    private readonly HashSet<(string, int, int)> _seen = [];
    private readonly List<MethodStatistics> _methods = [];

    public IReadOnlyList<EmittedCodeFinding> Findings => _findings;

    public IReadOnlyList<MethodStatistics> Methods => _methods;

    public override void Visit(SyntaxNode? node)
    {
        if (node is null)
        {
            return;
        }

        CheckSyntax(node);
        if (IsExecutableRoot(node))
        {
            CheckOperations(node);
        }

        base.Visit(node);
    }

    private void CheckSyntax(SyntaxNode node)
    {
        switch (node.Kind())
        {
            case SyntaxKind.ForStatement:
            case SyntaxKind.ForEachStatement:
            case SyntaxKind.ForEachVariableStatement:
            case SyntaxKind.WhileStatement:
            case SyntaxKind.DoStatement:
                Report(CSharpDiagnosticCodes.LoopOrJump, node, "a loop (" + FirstWord(node) + ")");
                break;
            case SyntaxKind.GotoStatement:
            case SyntaxKind.GotoCaseStatement:
            case SyntaxKind.GotoDefaultStatement:
                Report(CSharpDiagnosticCodes.LoopOrJump, node, "a goto");
                break;
            case SyntaxKind.LabeledStatement:
                Report(CSharpDiagnosticCodes.LoopOrJump, node, "a label (a goto target)");
                break;
            case SyntaxKind.StackAllocArrayCreationExpression:
            case SyntaxKind.ImplicitStackAllocArrayCreationExpression:
                Report(CSharpDiagnosticCodes.HeapAllocation, node, "a stackalloc array");
                break;
            case SyntaxKind.QueryExpression:
                Report(CSharpDiagnosticCodes.ForbiddenConstruct, node, "a LINQ query");
                break;
            case SyntaxKind.InterpolatedStringExpression:
                Report(CSharpDiagnosticCodes.HeapAllocation, node, "string interpolation");
                break;
            case SyntaxKind.YieldReturnStatement:
            case SyntaxKind.YieldBreakStatement:
                Report(CSharpDiagnosticCodes.ForbiddenConstruct, node, "an iterator (yield)");
                break;
            case SyntaxKind.UnsafeStatement:
            case SyntaxKind.FixedStatement:
                Report(CSharpDiagnosticCodes.ForbiddenConstruct, node, "unsafe code");
                break;
            case SyntaxKind.LocalFunctionStatement:
                Report(CSharpDiagnosticCodes.ForbiddenConstruct, node, "a local function");
                break;
            case SyntaxKind.ParenthesizedLambdaExpression:
            case SyntaxKind.SimpleLambdaExpression:
            case SyntaxKind.AnonymousMethodExpression:
                Report(CSharpDiagnosticCodes.HeapAllocation, node, "a lambda or anonymous method (a closure)");
                break;
        }
    }

    private static bool IsExecutableRoot(SyntaxNode node) => node switch
    {
        BlockSyntax block => block.Parent is BaseMethodDeclarationSyntax or AccessorDeclarationSyntax,
        ArrowExpressionClauseSyntax => true,
        EqualsValueClauseSyntax equals => equals.Parent is VariableDeclaratorSyntax { Parent.Parent: FieldDeclarationSyntax }
            || equals.Parent is PropertyDeclarationSyntax,
        ConstructorInitializerSyntax => true,
        PrimaryConstructorBaseTypeSyntax => true,
        _ => false,
    };

    private void CheckOperations(SyntaxNode root)
    {
        var operation = model.GetOperation(root);
        if (operation is null)
        {
            return;
        }

        var member = model.GetEnclosingSymbol(root.SpanStart);
        var operations = 0;
        var mathCalls = 0;
        foreach (var op in operation.DescendantsAndSelf())
        {
            var (counts, isMath) = Inspect(op, member);
            operations += counts ? 1 : 0;
            mathCalls += isMath ? 1 : 0;
        }

        if (member is IMethodSymbol { MethodKind: MethodKind.Ordinary } method
            && root.Parent is MethodDeclarationSyntax)
        {
            _methods.Add(new MethodStatistics(method.Name, operations, mathCalls));
        }
    }

    // Returns whether the operation counts as arithmetic, and whether it is a Math call.
    private (bool Counts, bool IsMath) Inspect(IOperation op, ISymbol? member)
    {
        var syntax = op.Syntax;
        switch (op)
        {
            case IObjectCreationOperation creation when creation.Type is not { IsValueType: true }:
                Report(CSharpDiagnosticCodes.HeapAllocation, syntax, "a new " + Describe(creation.Type) + " (a heap allocation)");
                break;
            case ITypeParameterObjectCreationOperation:
            case IAnonymousObjectCreationOperation:
            case IDynamicObjectCreationOperation:
                Report(CSharpDiagnosticCodes.HeapAllocation, syntax, "a new object of a type not known to be a struct");
                break;
            case IArrayCreationOperation:
                Report(CSharpDiagnosticCodes.HeapAllocation, syntax, "an array (a heap allocation)");
                break;
            case ICollectionExpressionOperation:
                Report(CSharpDiagnosticCodes.HeapAllocation, syntax, "a collection expression");
                break;
            case IAnonymousFunctionOperation:
            case IDelegateCreationOperation:
                Report(CSharpDiagnosticCodes.HeapAllocation, syntax, "a delegate or closure");
                break;
            case IInterpolatedStringOperation:
                Report(CSharpDiagnosticCodes.HeapAllocation, syntax, "string interpolation");
                break;
            case ILiteralOperation literal when literal.Type?.SpecialType == SpecialType.System_String:
                Report(CSharpDiagnosticCodes.ForbiddenConstruct, syntax, "a string");
                break;
            case IConversionOperation conversion when conversion.GetConversion().IsBoxing:
                Report(CSharpDiagnosticCodes.HeapAllocation, syntax,
                    "a boxing conversion of " + Describe(conversion.Operand.Type) + " to " + Describe(conversion.Type));
                break;
            case IConversionOperation { OperatorMethod: not null } conversion:
                Report(CSharpDiagnosticCodes.ForbiddenCall, syntax, "a call to the conversion " + Describe(conversion.OperatorMethod));
                break;
            case IInvocationOperation invocation:
                return InspectCall(invocation, member);
            case IBinaryOperation binary:
                if (binary.OperatorMethod is not null)
                {
                    Report(CSharpDiagnosticCodes.ForbiddenCall, syntax, "a call to the operator " + Describe(binary.OperatorMethod));
                }
                else if (binary.Type?.SpecialType == SpecialType.System_String)
                {
                    Report(CSharpDiagnosticCodes.HeapAllocation, syntax, "string concatenation");
                }

                return (IsArithmetic(binary.OperatorKind) && !binary.ConstantValue.HasValue, false);
            case IUnaryOperation unary:
                if (unary.OperatorMethod is not null)
                {
                    Report(CSharpDiagnosticCodes.ForbiddenCall, syntax, "a call to the operator " + Describe(unary.OperatorMethod));
                }

                return (unary.OperatorKind == UnaryOperatorKind.Minus && !unary.ConstantValue.HasValue, false);
            case ICompoundAssignmentOperation compound:
                if (compound.OperatorMethod is not null)
                {
                    Report(CSharpDiagnosticCodes.ForbiddenCall, syntax, "a call to the operator " + Describe(compound.OperatorMethod));
                }

                return (IsArithmetic(compound.OperatorKind), false);
            case IPropertyReferenceOperation property:
                if (!IsOurs(property.Property))
                {
                    Report(CSharpDiagnosticCodes.ForbiddenCall, syntax, "a call to the property " + Describe(property.Property));
                }
                else if (SymbolEqualityComparer.Default.Equals(property.Property.GetMethod, member))
                {
                    Report(CSharpDiagnosticCodes.Recursion, syntax, "the property " + property.Property.Name + " reads itself (recursion)");
                }

                break;
            case IFieldReferenceOperation field when !IsOurs(field.Field) && !field.Field.IsConst:
                Report(CSharpDiagnosticCodes.ForbiddenConstruct, syntax, "a read of the field " + Describe(field.Field));
                break;
            case IMethodReferenceOperation reference:
                Report(CSharpDiagnosticCodes.HeapAllocation, syntax, "a method group " + Describe(reference.Method) + " (a delegate)");
                break;
            case IEventReferenceOperation:
            case IRaiseEventOperation:
                Report(CSharpDiagnosticCodes.ForbiddenCall, syntax, "an event");
                break;
            case ILoopOperation:
                Report(CSharpDiagnosticCodes.LoopOrJump, syntax, "a loop");
                break;
            case IBranchOperation { BranchKind: BranchKind.GoTo }:
                Report(CSharpDiagnosticCodes.LoopOrJump, syntax, "a goto");
                break;
            case IThrowOperation:
                Report(CSharpDiagnosticCodes.ForbiddenConstruct, syntax, "a throw (exceptions allocate)");
                break;
            case ITryOperation:
            case IUsingOperation:
            case ILockOperation:
            case IAwaitOperation:
                Report(CSharpDiagnosticCodes.ForbiddenConstruct, syntax, "a " + op.Kind.ToString().ToLowerInvariant() + " statement");
                break;
            case ILocalFunctionOperation:
                Report(CSharpDiagnosticCodes.ForbiddenConstruct, syntax, "a local function");
                break;
            case IDynamicInvocationOperation:
            case IDynamicMemberReferenceOperation:
            case IDynamicIndexerAccessOperation:
                Report(CSharpDiagnosticCodes.ForbiddenCall, syntax, "a dynamic call");
                break;
        }

        return (false, false);
    }

    private (bool Counts, bool IsMath) InspectCall(IInvocationOperation invocation, ISymbol? member)
    {
        var target = invocation.TargetMethod;
        if (SymbolEqualityComparer.Default.Equals(target.OriginalDefinition, member?.OriginalDefinition))
        {
            Report(CSharpDiagnosticCodes.Recursion, invocation.Syntax, "the method " + target.Name + " calls itself (recursion)");
            return (false, false);
        }

        var type = target.ContainingType;
        var isMath = type is { Name: "Math" or "MathF", ContainingNamespace: { Name: "System", ContainingNamespace.IsGlobalNamespace: true } }
            && type.ContainingType is null;
        if (!isMath)
        {
            Report(CSharpDiagnosticCodes.ForbiddenCall, invocation.Syntax, "a call to " + Describe(target) + ", which is neither System.Math nor System.MathF");
            return (false, false);
        }

        return (true, true);
    }

    private bool IsOurs(ISymbol symbol) =>
        SymbolEqualityComparer.Default.Equals(symbol.ContainingAssembly, model.Compilation.Assembly);

    private static bool IsArithmetic(BinaryOperatorKind kind) => kind is BinaryOperatorKind.Add or BinaryOperatorKind.Subtract
        or BinaryOperatorKind.Multiply or BinaryOperatorKind.Divide or BinaryOperatorKind.Remainder;

    private static string Describe(ISymbol? symbol) =>
        symbol?.ToDisplayString(SymbolDisplayFormat.CSharpErrorMessageFormat) ?? "an unknown type";

    private static string FirstWord(SyntaxNode node) => node.GetFirstToken().Text;

    private void Report(string code, SyntaxNode node, string what)
    {
        var position = node.GetLocation().GetLineSpan().StartLinePosition;
        if (_seen.Add((code, position.Line, position.Character)))
        {
            _findings.Add(new EmittedCodeFinding(code, position.Line + 1, position.Character + 1, "the generated evaluator contains " + what));
        }
    }
}
