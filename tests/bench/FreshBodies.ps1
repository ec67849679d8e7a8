<#
.SYNOPSIS
    Times Test-InductionHazard for items of the filament model each of a size of its own, so that each builds its
    current paths afresh (their meshes, mutual inductances and modes): 50 mm-class aluminium discs (152 paths) and thick
    gold bands (60 paths) in the induction furnace's field (1.5 mT at 9.6 kHz, two minutes). Prints milliseconds an
    item, the fastest of three rounds after a warm-up; run it against two builds alternately to compare them.
.EXAMPLE
    dotnet pwsh -NoProfile -File tests/bench/FreshBodies.ps1 -ModulePath out/InductionHazard/InductionHazard.psd1
#>
param(
    [string] $ModulePath = (Join-Path $PSScriptRoot '../../out/InductionHazard/InductionHazard.psd1'),
    [int] $Rounds = 3
)
Import-Module $ModulePath
$furnace = New-FieldWaveform -Sine -Amplitude '1.5 mT' -Frequency '9.6 kHz' | New-FieldSource -Uniform -Name 'Furnace'
$kinds = [ordered]@{
    'disc' = { param($k) New-ConductiveItem -Name "Disc $k" -Shape Disc -Material Aluminium -Diameter "$(40 + 0.1 * $k) mm" -Thickness '3 mm' -Contact Held }
    'band' = { param($k) New-ConductiveItem -Name "Band $k" -Shape Ring -Material Gold -InnerDiameter "$(17 + 0.05 * $k) mm" -Width '4 mm' -Thickness '1.6 mm' -Contact Skin }
}
$next = 0
foreach ($kind in $kinds.Keys) {
    $null = Test-InductionHazard -Item (& $kinds[$kind] 0) -Source $furnace -ExposureTime '2 min'
    $best = [double]::MaxValue
    foreach ($round in 1..$Rounds) {
        $items = foreach ($i in 1..10) { $next++; & $kinds[$kind] $next }
        $t = Measure-Command { foreach ($item in $items) { $null = Test-InductionHazard -Item $item -Source $furnace -ExposureTime '2 min' } }
        $best = [math]::Min($best, $t.TotalMilliseconds / $items.Count)
    }
    '{0}: {1:F1} ms an item, each built afresh (fastest of {2} rounds of 10)' -f $kind, $best, $Rounds
}
