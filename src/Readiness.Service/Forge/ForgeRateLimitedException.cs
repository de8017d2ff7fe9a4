namespace Readiness.Service.Forge;

/// <summary>
/// The forge asked every caller under this token to wait longer than a job may hold its worker: the job goes back
/// to the queue until <see cref="Until"/>, without counting an attempt.
/// </summary>
public sealed class ForgeRateLimitedException(string what, DateTimeOffset until)
    : Exception($"the forge's rate limit holds {what} until {until:u}")
{
    public DateTimeOffset Until { get; } = until;
}
