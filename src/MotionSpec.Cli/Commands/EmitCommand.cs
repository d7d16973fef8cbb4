using System.CommandLine;
using System.Globalization;
using MotionSpec.Compiler;
using MotionSpec.CSharp;
using MotionSpec.CSharp.Analysis;
using MotionSpec.CSharp.Naming;
using MotionSpec.Language.Diagnostics;

namespace MotionSpec.Cli.Commands;

/// <summary>
/// <c>motionspec emit FILE</c>: a self-contained C# evaluator of the spec's reports, compiled in memory
/// before it is written.
/// </summary>
internal static class EmitCommand
{
    /// <summary>Builds the command.</summary>
    public static Command Create()
    {
        var file = SpecFileArgument.CreateOne("The .motion spec to turn into C#.");
        var output = OutputOption.Create("Where to write the .cs file. Default: standard output.", required: false);
        var ns = new Option<string>("--namespace")
        {
            Description = "The namespace of the generated class.",
            HelpName = "NS",
            DefaultValueFactory = _ => CSharpEmitOptions.DefaultNamespace,
        };
        var className = new Option<string>("--class")
        {
            Description = "The name of the generated static class. Default: the file name in Pascal case.",
            HelpName = "NAME",
        };
        var useFloat = new Option<bool>("--float") { Description = "Generate float arithmetic with MathF instead of double." };
        var stats = new Option<bool>("--stats") { Description = "Also print operation counts of the generated code on standard error." };
        var diagnostics = DiagnosticsOption.Create();

        var command = new Command("emit", "Write an allocation-free C# evaluator for the spec's reports, checked by compiling it.")
        {
            file,
            output,
            ns,
            className,
            useFloat,
            stats,
            diagnostics,
        };
        command.SetAction(parseResult => Run(
            new EmitRequest(
                parseResult.GetValue(file) ?? string.Empty,
                parseResult.GetValue(output),
                new CSharpEmitOptions(parseResult.GetValue(ns) ?? CSharpEmitOptions.DefaultNamespace, parseResult.GetValue(className), parseResult.GetValue(useFloat)),
                parseResult.GetValue(stats),
                DiagnosticsOption.Read(parseResult, diagnostics)),
            parseResult.InvocationConfiguration.Output,
            parseResult.InvocationConfiguration.Error));
        return command;
    }

    /// <summary>
    /// Check the spec, emit, compile and walk the result, then write it: the file is written (through a
    /// temporary file moved into place) only when every step passed, so a failing run leaves an existing
    /// output as it was.
    /// </summary>
    internal static int Run(EmitRequest request, TextWriter stdout, TextWriter stderr)
    {
        // Names on the command line are the command line's fault: exit 2 before reading anything.
        if (!CSharpIdentifier.IsDottedName(request.Options.Namespace))
        {
            stderr.WriteLine($"motionspec emit: --namespace '{request.Options.Namespace}' is not a dotted C# name such as Plant.Kinematics");
            return ExitCodes.Usage;
        }

        if (request.Options.ClassName is { } name && !CSharpIdentifier.IsAsciiIdentifier(name))
        {
            stderr.WriteLine($"motionspec emit: --class '{name}' is not a C# identifier (a letter or '_', then letters, digits or '_')");
            return ExitCodes.Usage;
        }

        var bytes = SpecFileLoader.TryRead(request.Path, stderr);
        if (bytes is null)
        {
            return ExitCodes.Usage;
        }

        var spec = SpecCompiler.Check(request.Path, bytes);
        var diagnostics = new DiagnosticWriter(stderr, request.Format);
        diagnostics.Add(request.Path, spec.Source, spec.Diagnostics);
        if (spec.HasErrors)
        {
            diagnostics.Complete();
            return ExitCodes.SpecErrors;
        }

        var emitted = CSharpEmitter.Emit(spec, request.Options);
        diagnostics.Add(request.Path, spec.Source, emitted.Diagnostics);
        if (emitted.Code is null)
        {
            diagnostics.Complete();
            return ExitCodes.SpecErrors;
        }

        var check = EmittedCodeCheck.Check(emitted.Code);
        diagnostics.Add(request.Path, spec.Source, check.Findings.Select(f => new Diagnostic(f.Code, DiagnosticSeverity.Error, default, f.ToString())));
        diagnostics.Complete();
        if (!check.Passed)
        {
            return ExitCodes.SpecErrors;
        }

        if (request.Stats)
        {
            WriteStats(emitted, check, stderr);
        }

        if (request.OutputPath is null)
        {
            stdout.Write(emitted.Code);
            return ExitCodes.Success;
        }

        var failure = AtomicFileWriter.TryWriteText(request.OutputPath, emitted.Code);
        if (failure is not null)
        {
            stderr.WriteLine("motionspec emit: " + failure);
            return ExitCodes.Usage;
        }

        return ExitCodes.Success;
    }

    private static void WriteStats(CSharpEmitResult emitted, EmittedCodeReport check, TextWriter stderr)
    {
        foreach (var method in emitted.Methods)
        {
            var counted = check.Methods.FirstOrDefault(m => m.Method == method.Method.TrimStart('@'));
            stderr.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"{method.Method} ({method.Report}): {counted?.Operations ?? 0} operations, {counted?.MathCalls ?? 0} of them Math calls, {method.Temporaries} locals"));
        }
    }
}

/// <summary>What <c>emit</c> was asked to do.</summary>
/// <param name="Path">The spec file.</param>
/// <param name="OutputPath">The .cs file to write, or null for standard output.</param>
/// <param name="Options">Namespace, class and number type.</param>
/// <param name="Stats">Print operation counts.</param>
/// <param name="Format">How diagnostics are printed.</param>
internal sealed record EmitRequest(string Path, string? OutputPath, CSharpEmitOptions Options, bool Stats, DiagnosticFormat Format);
