namespace Readiness.Cli;

/// <summary>Exit codes of cli.md.</summary>
public static class ExitCodes
{
    public const int Ready = 0;
    public const int NotReady = 1;
    public const int Usage = 2;
    public const int Uninspectable = 3;
}
