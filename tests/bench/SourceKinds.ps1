<#
.SYNOPSIS
    Times Test-InductionHazard for a worn 20 mm copper ring and a fixed 40 mm aluminium disc (the filament model) beside
    each kind of source, 0.3 m across and 0.1 m along from it: a line, a segment, a busbar, a three-phase set, a coil
    (10 kHz), a magnet's solenoid (a 20 ms run-down) and a dipole. Each is assessed four times to warm up, then ten
    times; prints milliseconds an assessment and the verdict. Run it against two builds alternately to compare them.
.EXAMPLE
    dotnet pwsh -NoProfile -File tests/bench/SourceKinds.ps1 -ModulePath out/InductionHazard/InductionHazard.psd1
#>
param([string] $ModulePath = (Join-Path $PSScriptRoot '../../out/InductionHazard/InductionHazard.psd1'))
Import-Module $ModulePath
$grid = New-FieldWaveform -Sine -Amplitude '2 kA' -Frequency '50 Hz'
$sources = [ordered]@{
    'line' = $grid | New-FieldSource -Conductor -Center '0, 0, 0'
    'segment' = $grid | New-FieldSource -Conductor -Start '0, 0, -1 m' -End '0, 0, 1 m'
    'busbar' = $grid | New-FieldSource -Busbar -Width '100 mm' -Thickness '10 mm'
    'three-phase' = $grid | New-FieldSource -ThreePhase -Spacing '150 mm'
    'coil' = New-FieldWaveform -Sine -Amplitude '50 A' -Frequency '10 kHz' | New-FieldSource -Coil -Radius '100 mm' -Turns 2000
    'solenoid' = New-FieldWaveform -Ramp -From '400 A' -To '0 A' -Duration '20 ms' | New-FieldSource -Solenoid -Radius '450 mm' -Length '1.6 m' -Turns 6000
    'dipole' = New-FieldWaveform -Sine -Amplitude 1 -Frequency '50 Hz' | New-FieldSource -Dipole -Moment '0, 0, 50'
}
$items = @(
    New-ConductiveItem -Name 'ring' -Material Copper -Diameter '20 mm' -WireDiameter '2 mm'
    New-ConductiveItem -Name 'disc' -Shape Disc -Material Aluminium -Diameter '40 mm' -Thickness '3 mm' -Contact Fixed
)
foreach ($kind in $sources.Keys) {
    foreach ($item in $items) {
        $at = @{ Item = $item; Source = $sources[$kind]; Position = '0.3, 0, 0.1' }
        foreach ($k in 1..4) { $null = Test-InductionHazard @at }
        $result = $null
        $time = Measure-Command { foreach ($k in 1..10) { $script:result = Test-InductionHazard @at } }
        '{0,-12} {1,-5} {2,8:F2} ms  {3}' -f $kind, $item.Name, ($time.TotalMilliseconds / 10), $result.Verdict
    }
}
