using System.Text;
using System.Text.Json;
using FilterQA.Core.Formats.Delimited;
using FilterQA.Core.Sweeps;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.AspNetCore.Http.Json;
using Microsoft.Extensions.Options;

namespace FilterQA.Web.Api.Intake;

/// <summary>
/// Turns a request into a <see cref="SweepBody"/>, or into the ProblemDetails that says what was wrong:
/// 413 too large, 415 wrong content type, 422 a bad JSON body or file name.
/// </summary>
public sealed class SweepBodyReader(IntakeOptions options, IOptions<JsonOptions> json)
{
    private static readonly string[] RawTypes = ["text/plain", "text/csv", "application/octet-stream"];

    public async Task<(SweepBody? Body, ProblemHttpResult? Problem)> ReadAsync(HttpRequest request, string? fileName, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(request);
        string mediaType = (request.ContentType ?? "").Split(';')[0].Trim().ToLowerInvariant();
        bool isJson = mediaType == "application/json";
        if (!isJson && !RawTypes.Contains(mediaType))
        {
            return (null, Problems.Make(StatusCodes.Status415UnsupportedMediaType, "Wrong content type",
                $"send the sweep as {string.Join(", ", RawTypes)} (with ?fileName=) or application/json; got '{(mediaType.Length == 0 ? "none" : mediaType)}'"));
        }
        byte[]? bytes = await ReadLimitedAsync(request, cancellationToken).ConfigureAwait(false);
        if (bytes is null)
        {
            return (null, Problems.Make(StatusCodes.Status413PayloadTooLarge, "Sweep too large",
                FormattableString.Invariant($"the body is larger than the {options.MaxSweepBytes} bytes allowed (Intake:MaxSweepBytes)")));
        }
        return isJson ? FromJson(bytes) : FromRaw(bytes, fileName);
    }

    private static (SweepBody?, ProblemHttpResult?) FromRaw(byte[] bytes, string? fileName)
    {
        if (SweepFileName.Problem(fileName) is { } problem)
        {
            return (null, Problems.Make(StatusCodes.Status422UnprocessableEntity, "Bad file name", $"the fileName query parameter: {problem}"));
        }
        return (new SweepBody(bytes, fileName!), null);
    }

    private (SweepBody?, ProblemHttpResult?) FromJson(byte[] bytes)
    {
        SweepJsonBody? body;
        try
        {
            body = JsonSerializer.Deserialize<SweepJsonBody>(bytes, json.Value.SerializerOptions);
        }
        catch (JsonException e)
        {
            string where = e.LineNumber is { } line ? FormattableString.Invariant($" at line {line + 1}, byte {e.BytePositionInLine + 1}") : "";
            return (null, Problems.Make(StatusCodes.Status422UnprocessableEntity, "Bad JSON body", $"the JSON body cannot be read{where}"));
        }
        if (body is null)
        {
            return (null, Problems.Make(StatusCodes.Status422UnprocessableEntity, "Bad JSON body", "the JSON body is null"));
        }
        if (SweepFileName.Problem(body.FileName is { } n && body.Touchstone is null ? Path.ChangeExtension(n, ".csv") : body.FileName) is { } nameProblem)
        {
            return (null, Problems.Make(StatusCodes.Status422UnprocessableEntity, "Bad file name", $"fileName: {nameProblem}"));
        }
        if (body.Touchstone is { } text)
        {
            return body.FrequencyHz is not null || body.GainDb is not null
                ? (null, Problems.Make(StatusCodes.Status422UnprocessableEntity, "Bad JSON body", "give either touchstone or frequencyHz and gainDb, not both"))
                : (new SweepBody(Encoding.UTF8.GetBytes(text), body.FileName!), null);
        }
        return FromArrays(body);
    }

    private static (SweepBody?, ProblemHttpResult?) FromArrays(SweepJsonBody body)
    {
        if (body.FrequencyHz is not { Length: > 0 } hz || body.GainDb is not { } gain)
        {
            return (null, Problems.Make(StatusCodes.Status422UnprocessableEntity, "Bad JSON body", "give touchstone, or frequencyHz and gainDb"));
        }
        if (gain.Length != hz.Length || (body.PhaseDeg is { } p && p.Length != hz.Length))
        {
            return (null, Problems.Make(StatusCodes.Status422UnprocessableEntity, "Bad JSON body", FormattableString.Invariant(
                $"frequencyHz has {hz.Length} values, gainDb {gain.Length}{(body.PhaseDeg is { } ph ? $", phaseDeg {ph.Length}" : "")}; they must be the same length")));
        }
        try
        {
            FrequencyGrid grid = FrequencyGrid.FromHz(hz);
            ScalarTrace trace = ScalarTrace.Create(grid, ScalarQuantity.GainDb, gain, body.PhaseDeg);
            string fileName = Path.ChangeExtension(body.FileName!, ".csv");
            using var writer = new StringWriter(System.Globalization.CultureInfo.InvariantCulture);
            DelimitedTextWriter.Write(Sweep.FromScalar(trace, SweepSource.Of(fileName, SweepFormat.DelimitedText)), writer);
            return (new SweepBody(Encoding.UTF8.GetBytes(writer.ToString()), fileName), null);
        }
        catch (ArgumentException e)
        {
            return (null, Problems.Make(StatusCodes.Status422UnprocessableEntity, "Bad JSON body", $"the arrays do not make a sweep: {e.Message}"));
        }
    }

    // Null when the body is larger than allowed; the declared length is checked before anything is read.
    private async Task<byte[]?> ReadLimitedAsync(HttpRequest request, CancellationToken cancellationToken)
    {
        long limit = options.MaxSweepBytes;
        if (request.ContentLength is { } declared && declared > limit)
        {
            return null;
        }
        using var buffer = new MemoryStream();
        byte[] chunk = new byte[81920];
        int read;
        while ((read = await request.Body.ReadAsync(chunk, cancellationToken).ConfigureAwait(false)) > 0)
        {
            if (buffer.Length + read > limit)
            {
                return null;
            }
            buffer.Write(chunk, 0, read);
        }
        return buffer.ToArray();
    }
}
