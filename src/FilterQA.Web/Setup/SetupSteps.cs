using FilterQA.Data;
using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Web.Setup;

/// <summary>Marker rows of one-time start-up steps, so a step is never done twice.</summary>
internal static class SetupSteps
{
    public const string Administrator = "first-administrator";
    public const string DemoAccounts = "demo-accounts";
    public const string DemoData = "demo-data";

    public static Task<bool> IsDoneAsync(FilterQaDbContext context, string name, CancellationToken cancellationToken) =>
        context.SetupSteps.AnyAsync(s => s.Name == name, cancellationToken);

    public static async Task MarkDoneAsync(FilterQaDbContext context, string name, TimeProvider clock, CancellationToken cancellationToken)
    {
        context.SetupSteps.Add(new SetupStepRecord { Name = name, DoneAt = clock.GetUtcNow() });
        await context.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
    }
}
