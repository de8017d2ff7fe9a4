namespace Readiness.Testing;

/// <summary>One finding of a reference validator: its level (error, warning, note), rule id and message.</summary>
public sealed record ValidatorFinding(string Level, string Rule, string Message)
{
    public override string ToString() => $"{Level} {Rule}: {Message}";
}
