namespace LunarShadow.Astronomy.Tests.Support;

/// <summary>Finds files of the repository from the test's output folder.</summary>
internal static class RepositoryFiles
{
    public static string Root
    {
        get
        {
            var dir = new DirectoryInfo(AppContext.BaseDirectory);
            while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "LunarShadow.sln"))) dir = dir.Parent;
            return dir?.FullName ?? throw new InvalidOperationException("LunarShadow.sln not found above the test folder.");
        }
    }

    public static string PathOf(string relative) => Path.Combine(Root, relative);
}
