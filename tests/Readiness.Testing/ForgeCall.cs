namespace Readiness.Testing;

/// <summary>One request the forge stand-in received, as it received it.</summary>
/// <param name="Method">GET, POST, PATCH.</param>
/// <param name="Path">The path, from <c>/api/v3/</c> on.</param>
/// <param name="Body">The request body (UTF-8).</param>
/// <param name="Authorization">The Authorization header, if any.</param>
/// <param name="Status">The status code answered (0 when the client went away first).</param>
/// <param name="At">When the answer was recorded.</param>
public sealed record ForgeCall(string Method, string Path, string Body, string? Authorization, int Status, DateTimeOffset At = default);
