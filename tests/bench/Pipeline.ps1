<#
.SYNOPSIS
    Times a 20,000-row inventory from Import-Csv through Test-InductionHazard against the same rows through a
    ForEach-Object that computes only the textbook emf and e/R, in the same process, for a ramp and a sine.
#>
param(
    [string] $ModulePath = (Join-Path $PSScriptRoot '../../out/InductionHazard/InductionHazard.psd1'),
    [int] $Rows = 20000
)
Import-Module $ModulePath
$csv = Join-Path ([IO.Path]::GetTempPath()) 'induction-hazard-pipeline.csv'
$lines = [System.Collections.Generic.List[string]]::new()
$lines.Add('Name,Material,Diameter,WireDiameter,Contact')
foreach ($k in 1..$Rows) { $lines.Add("Ring $k,Copper,$(18 + ($k % 10)) mm,2 mm,Skin") }
[IO.File]::WriteAllLines($csv, $lines)
$sources = @{
    'ramp 1 T in 10 ms' = New-FieldWaveform -Ramp -From '0 T' -To '1 T' -Duration '10 ms' | New-FieldSource
    'sine 10 mT, 50 Hz' = New-FieldWaveform -Sine -Amplitude '10 mT' -Frequency '50 Hz' | New-FieldSource
}
$rho = 1.7241e-8
foreach ($name in $sources.Keys) {
    $textbook = Measure-Command {
        Import-Csv $csv | ForEach-Object {
            $d = [double]($_.Diameter -replace ' mm', '') / 1000; $w = 0.002
            $emf = [math]::PI * $d * $d / 4 * 100
            $emf / ($rho * [math]::PI * $d / ([math]::PI * $w * $w / 4))
        } | Out-Null
    }
    $module = Measure-Command { Import-Csv $csv | Test-InductionHazard -Source $sources[$name] -WarningAction SilentlyContinue | Out-Null }
    '{0}: {1} rows, textbook {2:F1} s, Test-InductionHazard {3:F1} s, ratio {4:F1}' -f $name, $Rows, $textbook.TotalSeconds, $module.TotalSeconds, ($module.TotalSeconds / $textbook.TotalSeconds)
}
Remove-Item $csv
