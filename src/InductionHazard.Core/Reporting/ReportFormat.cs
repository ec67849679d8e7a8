namespace InductionHazard.Reporting;

/// <summary>The forms a hazard report is written in.</summary>
public enum ReportFormat
{
    /// <summary>One self-contained web page (inline style and SVG charts, no script, no network), for screen and print.</summary>
    Html,

    /// <summary>The same content as text and tables, for wikis and change tickets.</summary>
    Markdown,

    /// <summary>One row per item, numbers in SI with the unit in the header, for spreadsheets.</summary>
    Csv,

    /// <summary>The full records for other tools; time series summarised unless asked for.</summary>
    Json,
}
