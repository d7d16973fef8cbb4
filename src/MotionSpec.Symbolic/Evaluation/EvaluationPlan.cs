namespace MotionSpec.Symbolic;

/// <summary>
/// A flat compiled tape for evaluating many outputs at many states: each distinct node is one register,
/// computed once per Evaluate, with no allocation per call.
/// </summary>
public sealed class EvaluationPlan
{
    private readonly Instruction[] _tape;
    private readonly int[] _operands;
    private readonly int[] _outputRegisters;
    private readonly int _registerCount;
    private double[]? _spare;

    private EvaluationPlan(Instruction[] tape, int[] operands, int[] outputRegisters, int registerCount, int inputCount)
    {
        _tape = tape;
        _operands = operands;
        _outputRegisters = outputRegisters;
        _registerCount = registerCount;
        InputCount = inputCount;
        _spare = new double[registerCount];
    }

    private enum OpCode : byte
    {
        Constant,
        Input,
        Add,
        Multiply,
        Power,
        Function,
        Atan2,
    }

    /// <summary>How many input values Evaluate reads.</summary>
    public int InputCount { get; }

    /// <summary>How many output values Evaluate writes.</summary>
    public int OutputCount => _outputRegisters.Length;

    /// <summary>Number of tape instructions (each distinct node once).</summary>
    public int InstructionCount => _tape.Length;

    /// <summary>Compiles outputs over the given input symbols.</summary>
    /// <exception cref="ArgumentException">An output uses a symbol that is not among the inputs.</exception>
    public static EvaluationPlan Compile(IReadOnlyList<Expr> outputs, IReadOnlyList<Symbol> inputs)
    {
        if (outputs is null)
        {
            throw new ArgumentNullException(nameof(outputs));
        }

        if (inputs is null)
        {
            throw new ArgumentNullException(nameof(inputs));
        }

        var inputIndex = new Dictionary<Symbol, int>();
        for (int i = 0; i < inputs.Count; i++)
        {
            if (!inputIndex.TryGetValue(inputs[i], out _))
            {
                inputIndex[inputs[i]] = i;
            }
        }

        var register = new Dictionary<Expr, int>();
        var tape = new List<Instruction>();
        var operands = new List<int>();
        foreach (var node in DagWalk.PostOrder(outputs))
        {
            var ins = new Instruction();
            switch (node)
            {
                case Number n:
                    ins.Op = OpCode.Constant;
                    ins.Value = n.Value.ToDouble();
                    break;
                case PiConstant:
                    ins.Op = OpCode.Constant;
                    ins.Value = Math.PI;
                    break;
                case Symbol s:
                    if (!inputIndex.TryGetValue(s, out int at))
                    {
                        throw new ArgumentException("The symbol '" + TextPrinter.Print(s) + "' is used but is not an input.", nameof(inputs));
                    }

                    ins.Op = OpCode.Input;
                    ins.A = at;
                    break;
                case Sum or Product:
                    ins.Op = node is Sum ? OpCode.Add : OpCode.Multiply;
                    ins.Start = operands.Count;
                    ins.Count = node.Children.Length;
                    foreach (var child in node.Children)
                    {
                        operands.Add(register[child]);
                    }

                    break;
                case Power pw:
                    ins.Op = OpCode.Power;
                    ins.A = register[pw.Base];
                    (ins.PowerCode, ins.Value) = DoubleSemantics.Classify(pw.Exponent);
                    break;
                case Call { Function: Function.Atan2 } c:
                    ins.Op = OpCode.Atan2;
                    ins.A = register[c.Children[0]];
                    ins.B = register[c.Children[1]];
                    break;
                case Call c:
                    ins.Op = OpCode.Function;
                    ins.Function = c.Function;
                    ins.A = register[c.Children[0]];
                    break;
            }

            register[node] = tape.Count;
            tape.Add(ins);
        }

        var outputRegisters = new int[outputs.Count];
        for (int i = 0; i < outputs.Count; i++)
        {
            outputRegisters[i] = register[outputs[i]];
        }

        return new EvaluationPlan([.. tape], [.. operands], outputRegisters, tape.Count, inputs.Count);
    }

    /// <summary>Evaluates every output at one state; inputs in the order given to Compile. Thread-safe.</summary>
    /// <exception cref="ArgumentException">A span is shorter than InputCount or OutputCount.</exception>
    public void Evaluate(ReadOnlySpan<double> inputs, Span<double> outputs)
    {
        if (inputs.Length < InputCount)
        {
            throw new ArgumentException("Too few input values.", nameof(inputs));
        }

        if (outputs.Length < OutputCount)
        {
            throw new ArgumentException("Too few output slots.", nameof(outputs));
        }

        // One buffer serves the common single-threaded sweep; a concurrent caller gets its own.
        var r = Interlocked.Exchange(ref _spare, null) ?? new double[_registerCount];
        var tape = _tape;
        var ops = _operands;
        for (int i = 0; i < tape.Length; i++)
        {
            ref readonly var ins = ref tape[i];
            double v;
            switch (ins.Op)
            {
                case OpCode.Constant:
                    v = ins.Value;
                    break;
                case OpCode.Input:
                    v = inputs[ins.A];
                    break;
                case OpCode.Add:
                    v = r[ops[ins.Start]];
                    for (int k = 1; k < ins.Count; k++)
                    {
                        v += r[ops[ins.Start + k]];
                    }

                    break;
                case OpCode.Multiply:
                    v = r[ops[ins.Start]];
                    for (int k = 1; k < ins.Count; k++)
                    {
                        v *= r[ops[ins.Start + k]];
                    }

                    break;
                case OpCode.Power:
                    v = DoubleSemantics.Pow(r[ins.A], ins.PowerCode, ins.Value);
                    break;
                case OpCode.Atan2:
                    v = Math.Atan2(r[ins.A], r[ins.B]);
                    break;
                default:
                    v = DoubleSemantics.Apply(ins.Function, r[ins.A]);
                    break;
            }

            r[i] = v;
        }

        for (int i = 0; i < _outputRegisters.Length; i++)
        {
            outputs[i] = r[_outputRegisters[i]];
        }

        _spare = r;
    }

    private struct Instruction
    {
        public OpCode Op;
        public Function Function;
        public int A;
        public int B;
        public int Start;
        public int Count;
        public double Value;
        public int PowerCode;
    }
}
