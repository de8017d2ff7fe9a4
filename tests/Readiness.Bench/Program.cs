using System.Reflection;
using Readiness.Bench;

var benches = Assembly.GetExecutingAssembly().GetTypes()
    .Where(t => t is { IsClass: true, IsAbstract: false } && typeof(IBench).IsAssignableFrom(t))
    .Select(t => (IBench)Activator.CreateInstance(t)!)
    .OrderBy(b => b.Name, StringComparer.Ordinal)
    .ToList();

if (args.Length == 0 || args[0] is "list" or "--help")
{
    Console.WriteLine("usage: dotnet run --project tests/Readiness.Bench -c Release -- NAME [args]   (or 'all')");
    foreach (var bench in benches)
    {
        Console.WriteLine($"  {bench.Name,-20} {bench.Description}");
    }

    return 0;
}

var chosen = args[0] == "all" ? benches : benches.Where(b => b.Name == args[0]).ToList();
if (chosen.Count == 0)
{
    Console.Error.WriteLine($"no bench named '{args[0]}'; try 'list'");
    return 2;
}

foreach (var bench in chosen)
{
    Console.WriteLine($"== {bench.Name}: {bench.Description}");
    await bench.RunAsync(args[1..], CancellationToken.None);
}

return 0;
