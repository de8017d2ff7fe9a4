using Readiness.Core.Checklists;

namespace Readiness.Core.Tests.Checklists;

internal sealed class TestChecklistSource(Dictionary<string, string> files) : IChecklistSource
{
    public IEnumerable<string> Names => files.Keys;

    public (string File, string Text)? Find(string name) =>
        files.TryGetValue(name, out var text) ? ($"{name}.yml", text) : new BuiltInChecklists().Find(name);
}
