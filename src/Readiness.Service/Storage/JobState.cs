namespace Readiness.Service.Storage;

/// <summary>The states a job row goes through; the lowercase names are stored.</summary>
public static class JobState
{
    public const string Queued = "queued";
    public const string Running = "running";
    public const string Done = "done";

    /// <summary>The pull request turned out not to be a release candidate.</summary>
    public const string Skipped = "skipped";

    /// <summary>A newer job for the same pull request made this one pointless.</summary>
    public const string Superseded = "superseded";

    /// <summary>Gave up after the configured number of attempts.</summary>
    public const string Failed = "failed";
}
