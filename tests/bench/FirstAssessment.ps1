<#
.SYNOPSIS
    Imports the module in this fresh shell, waits -Wait seconds (0: a script's next line; 1.5: a person typing), then
    times the first assessment: a source and an item made from unit strings and one Test-InductionHazard.
.EXAMPLE
    dotnet pwsh -NoProfile -File tests/bench/FirstAssessment.ps1 -Wait 0
#>
param(
    [string] $ModulePath = (Join-Path $PSScriptRoot '../../out/InductionHazard/InductionHazard.psd1'),
    [double] $Wait = 0
)
$clock = [Diagnostics.Stopwatch]::StartNew()
Import-Module $ModulePath
$imported = $clock.Elapsed.TotalSeconds
Start-Sleep -Milliseconds ([int]($Wait * 1000))
$clock.Restart()
$source = New-FieldWaveform -Sine -Amplitude '10 mT' -Frequency '50 Hz' | New-FieldSource
$result = New-ConductiveItem -Name 'Wedding band' -Material Copper -Diameter '20 mm' -WireDiameter '2 mm' | Test-InductionHazard -Source $source
'Import-Module {0:F2} s; waited {1:F1} s; first assessment {2:F2} s ({3})' -f $imported, $Wait, $clock.Elapsed.TotalSeconds, $result.Verdict
