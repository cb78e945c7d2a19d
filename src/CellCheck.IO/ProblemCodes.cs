namespace CellCheck.IO;

/// <summary>
/// Stable codes of the problems CellCheck reports about the user's files. The README's error catalogue documents
/// each with an example and the fix. A code never changes meaning; new codes are added, none are reused.
/// </summary>
public static class ProblemCodes
{
    public const string DesignNotFound = "design.not-found";
    public const string DesignUnreadable = "design.unreadable";
    public const string DesignTooLarge = "design.too-large";
    public const string YamlSyntax = "design.yaml-syntax";
    public const string NotAMapping = "design.not-a-mapping";
    public const string UnknownKey = "design.unknown-key";
    public const string DuplicateKey = "design.duplicate-key";
    public const string MissingKey = "design.missing-key";
    public const string WrongType = "design.wrong-type";
    public const string EmptyList = "design.empty-list";
    public const string DuplicateName = "design.duplicate-name";
    public const string ResponseIsFactor = "design.response-is-factor";
    public const string BadAlpha = "design.bad-alpha";
    public const string BadAdjust = "design.bad-adjust";
    public const string BadKind = "design.bad-kind";
    public const string MissingColumn = "design.missing-column";
    public const string BadDataOption = "design.bad-data-option";
    public const string BadWhere = "design.bad-where";
    public const string BadAdjustAcross = "design.bad-adjust-across";
    public const string BadModel = "design.bad-model";
    public const string UnknownTerm = "design.unknown-term";
    public const string DuplicateTerm = "design.duplicate-term";
    public const string DesignEncoding = "design.encoding";
    public const string DesignNotText = "design.not-text";
    public const string AliasLimit = "design.alias-limit";
    public const string TooDeep = "design.too-deep";
    public const string MultipleDocuments = "design.multiple-documents";

    public const string DataNotFound = "data.not-found";
    public const string DataUnreadable = "data.unreadable";
    public const string DataEmpty = "data.empty";
    public const string DataNoRows = "data.no-rows";
    public const string DataUnsupportedFormat = "data.unsupported-format";
    public const string DuplicateColumn = "data.duplicate-column";
    public const string RaggedRow = "data.ragged-row";
    public const string BadRunOrder = "data.bad-run-order";
    public const string NonNumericLevel = "data.non-numeric-level";
    public const string DuplicateRun = "data.duplicate-run";
    public const string ThousandsSeparator = "data.thousands-separator";
    public const string SheetNotFound = "data.sheet-not-found";
    public const string EmptyHeader = "data.empty-header";
    public const string NoRowsLeft = "data.no-rows-left";
    public const string DataEncoding = "data.encoding";
    public const string DataNotText = "data.not-text";
    public const string LineTooLong = "data.line-too-long";
    public const string UnclosedQuote = "data.unclosed-quote";

    public const string PlanMissingEffect = "plan.missing-effect";
    public const string PlanBadEffect = "plan.bad-effect";
    public const string PlanBadSd = "plan.bad-sd";
    public const string PlanBadPower = "plan.bad-power";
    public const string PlanBadAlpha = "plan.bad-alpha";
    public const string PlanBadDraws = "plan.bad-draws";
    public const string PlanUnknownResponse = "plan.unknown-response";

    public const string OutputIsInput = "output.is-input";
    public const string OutputUnwritable = "output.unwritable";
    public const string OutputExists = "output.exists";

    public const string BadTransform = "usage.bad-transform";
    public const string BadShift = "usage.bad-shift";
}
