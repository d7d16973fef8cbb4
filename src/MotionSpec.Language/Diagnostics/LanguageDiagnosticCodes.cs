using System.Reflection;

namespace MotionSpec.Language.Diagnostics;

/// <summary>
/// Every code the front end reports: MOT1 syntax, MOT2 names and frames, MOT3 units and dimensions.
/// Later stages own MOT4 (kinematics) and MOT5 (evaluation and output).
/// </summary>
public static class LanguageDiagnosticCodes
{
    /// <summary>The file is not valid UTF-8.</summary>
    public const string InvalidUtf8 = "MOT1001";

    /// <summary>The file is larger than the size limit.</summary>
    public const string FileTooLarge = "MOT1002";

    /// <summary>A character that starts no token.</summary>
    public const string UnexpectedCharacter = "MOT1101";

    /// <summary>A decimal point with no digit after it, such as <c>1.</c>.</summary>
    public const string DigitAfterPointExpected = "MOT1102";

    /// <summary>More than two marks after a name, such as <c>q'''</c>.</summary>
    public const string TooManyMarks = "MOT1103";

    /// <summary>A string with no closing quote on its line.</summary>
    public const string UnterminatedString = "MOT1104";

    /// <summary>A backslash in a string not followed by a quote or a backslash.</summary>
    public const string InvalidEscape = "MOT1105";

    /// <summary>A string anywhere but after <c>title</c>.</summary>
    public const string MisplacedString = "MOT1106";

    /// <summary>A mark not written directly after a name.</summary>
    public const string MisplacedMark = "MOT1107";

    /// <summary>A number literal longer than the limit.</summary>
    public const string NumberTooLong = "MOT1108";

    /// <summary>A statement that does not follow the grammar.</summary>
    public const string SyntaxError = "MOT1201";

    /// <summary>Text where a statement keyword is expected.</summary>
    public const string StatementExpected = "MOT1202";

    /// <summary><c>rotate</c>, <c>origin</c> or <c>spin</c> outside a frame's block.</summary>
    public const string MisplacedFrameItem = "MOT1203";

    /// <summary>A frame block with no closing brace.</summary>
    public const string UnclosedBlock = "MOT1204";

    /// <summary>A brace that opens or closes no frame block.</summary>
    public const string MisplacedBrace = "MOT1205";

    /// <summary>A second <c>title</c>.</summary>
    public const string DuplicateTitle = "MOT1206";

    /// <summary>A block after a root frame, which has no parent to move in.</summary>
    public const string RootFrameBlock = "MOT1207";

    /// <summary>A rotation axis that is not x, y, z or a bracket of numbers.</summary>
    public const string AxisNotNumbers = "MOT1208";

    /// <summary>A <c>spin</c> that is not a bare bracket.</summary>
    public const string SpinNotBracket = "MOT1209";

    /// <summary>An expression nested deeper than the limit.</summary>
    public const string NestingTooDeep = "MOT1301";

    /// <summary>A statement with more operators than the limit.</summary>
    public const string StatementTooLong = "MOT1302";

    /// <summary>A name that is not declared before this point.</summary>
    public const string UnknownName = "MOT2201";

    /// <summary>A name declared twice.</summary>
    public const string DuplicateName = "MOT2202";

    /// <summary>A frame name that is not declared before this point.</summary>
    public const string UnknownFrame = "MOT2203";

    /// <summary>A report subject that is neither a declared point nor a declared frame.</summary>
    public const string UnknownSubject = "MOT2204";

    /// <summary>A declared name used as something it is not (a param as a frame, a frame as a value).</summary>
    public const string WrongKind = "MOT2205";

    /// <summary>A frame named inside its own block.</summary>
    public const string FrameInOwnBlock = "MOT2206";

    /// <summary>A mark after a name that is not a coord.</summary>
    public const string MarkOnNonCoord = "MOT2207";

    /// <summary>A param whose definition uses t, a coord, a mark or a let.</summary>
    public const string ParamNotConstant = "MOT2208";

    /// <summary>A frame with both <c>rotate</c> and <c>spin</c>.</summary>
    public const string RotateAndSpin = "MOT2209";

    /// <summary>A second <c>origin</c> in one frame.</summary>
    public const string DuplicateOrigin = "MOT2210";

    /// <summary>A second <c>spin</c> in one frame.</summary>
    public const string DuplicateSpin = "MOT2211";

    /// <summary>A rotation axis of length zero.</summary>
    public const string ZeroAxis = "MOT2212";

    /// <summary>Frames of one report that lie in different trees.</summary>
    public const string ReportAcrossTrees = "MOT2213";

    /// <summary><c>via</c> on a report of a frame.</summary>
    public const string ViaOnFrameReport = "MOT2214";

    /// <summary>Two report names that differ only in the case of their first letter.</summary>
    public const string ReportNameClash = "MOT2215";

    /// <summary>A frame deeper in its tree than the limit.</summary>
    public const string TreeTooDeep = "MOT2216";

    /// <summary>More frames than the limit.</summary>
    public const string TooManyFrames = "MOT2217";

    /// <summary>More points than the limit.</summary>
    public const string TooManyPoints = "MOT2218";

    /// <summary>More reports than the limit.</summary>
    public const string TooManyReports = "MOT2219";

    /// <summary>A unit name that is not one of the unit atoms.</summary>
    public const string UnknownUnit = "MOT3001";

    /// <summary>Two sides of <c>+</c>, <c>-</c> or a comparison with different dimensions.</summary>
    public const string DimensionMismatch = "MOT3002";

    /// <summary>An expression whose dimension does not fit its place (angle, length, rate).</summary>
    public const string WrongDimension = "MOT3003";

    /// <summary>A function argument that is not an angle or free.</summary>
    public const string FunctionArgumentDimension = "MOT3004";

    /// <summary><c>sqrt</c> of a dimension with an odd exponent.</summary>
    public const string SqrtOddDimension = "MOT3005";

    /// <summary>A fractional power of a value that has a dimension.</summary>
    public const string FractionalPowerOfDimension = "MOT3006";

    /// <summary>A bracket whose components have different dimensions.</summary>
    public const string BracketDimensions = "MOT3007";

    /// <summary>A constant that is not a finite number.</summary>
    public const string NonFiniteConstant = "MOT3008";

    /// <summary>A division by a constant zero.</summary>
    public const string DivisionByZero = "MOT3009";

    /// <summary>The exponent of <c>^</c> is not made of numbers only.</summary>
    public const string ExponentNotNumbers = "MOT3010";

    /// <summary>An exponent larger than the limit.</summary>
    public const string ExponentTooLarge = "MOT3011";

    /// <summary>A scalar where a vector is needed.</summary>
    public const string VectorExpected = "MOT3012";

    /// <summary>A vector where a scalar is needed.</summary>
    public const string ScalarExpected = "MOT3013";

    /// <summary>Arithmetic that vectors do not have (vector times vector, scalar over vector, vector plus scalar).</summary>
    public const string InvalidVectorArithmetic = "MOT3014";

    /// <summary><c>atan2</c> of two arguments with different dimensions.</summary>
    public const string Atan2Dimensions = "MOT3015";

    /// <summary>A function called with the wrong number of arguments.</summary>
    public const string ArgumentCount = "MOT3016";

    /// <summary>Every code with its one-line description, in code order.</summary>
    public static IReadOnlyList<KeyValuePair<string, string>> All { get; } = Catalog();

    private static List<KeyValuePair<string, string>> Catalog() =>
    [
        new(InvalidUtf8, "the file is not valid UTF-8"),
        new(FileTooLarge, "the file is larger than the size limit"),
        new(UnexpectedCharacter, "a character that starts no token"),
        new(DigitAfterPointExpected, "a decimal point needs a digit after it"),
        new(TooManyMarks, "at most two marks follow a coord's name"),
        new(UnterminatedString, "a string needs its closing quote on the same line"),
        new(InvalidEscape, "only \\\" and \\\\ are escapes in a string"),
        new(MisplacedString, "a string is allowed only after title"),
        new(MisplacedMark, "a mark goes directly after a coord's name"),
        new(NumberTooLong, "a number literal is longer than the limit"),
        new(SyntaxError, "the statement does not follow the grammar"),
        new(StatementExpected, "a statement keyword is expected"),
        new(MisplacedFrameItem, "rotate, origin and spin belong inside a frame's block"),
        new(UnclosedBlock, "a frame block has no closing brace"),
        new(MisplacedBrace, "a brace opens or closes no frame block"),
        new(DuplicateTitle, "a spec has at most one title"),
        new(RootFrameBlock, "a root frame has no block"),
        new(AxisNotNumbers, "a rotation axis is x, y, z or a bracket of numbers"),
        new(SpinNotBracket, "spin takes a bare bracket of rates"),
        new(NestingTooDeep, "an expression is nested deeper than the limit"),
        new(StatementTooLong, "a statement has more operators than the limit"),
        new(UnknownName, "a name is not declared before this point"),
        new(DuplicateName, "a name is declared twice"),
        new(UnknownFrame, "a frame is not declared before this point"),
        new(UnknownSubject, "a report's subject is neither a point nor a frame"),
        new(WrongKind, "a name is used as something it is not"),
        new(FrameInOwnBlock, "a frame is not in scope inside its own block"),
        new(MarkOnNonCoord, "marks go only on coords"),
        new(ParamNotConstant, "a param cannot use t, coords, marks or lets"),
        new(RotateAndSpin, "a frame has rotate statements or spin, not both"),
        new(DuplicateOrigin, "a frame has at most one origin"),
        new(DuplicateSpin, "a frame has at most one spin"),
        new(ZeroAxis, "a rotation axis cannot be zero"),
        new(ReportAcrossTrees, "the frames of a report must lie in one tree"),
        new(ViaOnFrameReport, "via applies only to point reports"),
        new(ReportNameClash, "report names must differ after upper-casing their first letter"),
        new(TreeTooDeep, "a frame is deeper than the tree depth limit"),
        new(TooManyFrames, "the spec has more frames than the limit"),
        new(TooManyPoints, "the spec has more points than the limit"),
        new(TooManyReports, "the spec has more reports than the limit"),
        new(UnknownUnit, "a unit name is not a known unit"),
        new(DimensionMismatch, "the two sides of + or - have different dimensions"),
        new(WrongDimension, "an expression's dimension does not fit its place"),
        new(FunctionArgumentDimension, "a function's argument must be an angle or free"),
        new(SqrtOddDimension, "sqrt needs even dimension exponents"),
        new(FractionalPowerOfDimension, "a fractional power needs an angle or a free base"),
        new(BracketDimensions, "a bracket's components have different dimensions"),
        new(NonFiniteConstant, "a constant is not a finite number"),
        new(DivisionByZero, "a division by a constant zero"),
        new(ExponentNotNumbers, "the exponent of ^ must be made of numbers only"),
        new(ExponentTooLarge, "an exponent is larger than the limit"),
        new(VectorExpected, "a vector is needed here"),
        new(ScalarExpected, "a scalar is needed here"),
        new(InvalidVectorArithmetic, "vectors do not have this arithmetic"),
        new(Atan2Dimensions, "atan2 needs arguments of one dimension"),
        new(ArgumentCount, "a function has the wrong number of arguments"),
    ];

    /// <summary>The description of a code, or null when the code is not one of the front end's.</summary>
    public static string? Describe(string code)
    {
        foreach (var entry in All)
        {
            if (string.Equals(entry.Key, code, StringComparison.Ordinal))
            {
                return entry.Value;
            }
        }

        return null;
    }

    /// <summary>The codes declared as constants in this class (tests check that <see cref="All"/> lists each).</summary>
    internal static IEnumerable<string> DeclaredConstants() =>
        typeof(LanguageDiagnosticCodes)
            .GetFields(BindingFlags.Public | BindingFlags.Static)
            .Where(f => f.IsLiteral)
            .Select(f => (string)f.GetRawConstantValue()!);
}
