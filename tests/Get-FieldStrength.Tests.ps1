param([string] $ModulePath = (Join-Path $PSScriptRoot '../out/InductionHazard/InductionHazard.psd1'))

BeforeAll {
    Import-Module $ModulePath -Force
    $mu0 = 4e-7 * [math]::PI
    $line = New-FieldWaveform -Sine -Amplitude '1 kA' -Frequency '50 Hz' | New-FieldSource -Conductor -Axis z -Name 'Feeder'
}

Describe 'Get-FieldStrength' {
    # Validates: the cmdlet's peak B and dB/dt | Ampere's law | 1e-4, 1e-3
    It 'gives a line current''s field by Ampere''s law at each point, in order' {
        $s = @(Get-FieldStrength -Source $line -Position '100 mm,0,0', '0,400 mm,0')
        $s.Count | Should -Be 2
        [math]::Abs($s[0].PeakFluxDensityTesla / ($mu0 * 1000 / (2 * [math]::PI * 0.1)) - 1) | Should -BeLessThan 1e-4
        [math]::Abs($s[1].PeakFluxDensityTesla / ($mu0 * 1000 / (2 * [math]::PI * 0.4)) - 1) | Should -BeLessThan 1e-4
        [math]::Abs($s[0].PeakRateTeslaPerSecond / (2 * [math]::PI * 50 * $s[0].PeakFluxDensityTesla) - 1) | Should -BeLessThan 1e-3
        $s[0].FrequencyHertz | Should -Be 50
    }

    It 'takes points piped as themselves, as Test-FieldExposure does, and names a point it cannot read' {
        $piped = @('100 mm, 0, 0', '0, 0.4, 0' | Get-FieldStrength -Source $line)
        $given = @(Get-FieldStrength -Source $line -Position '100 mm,0,0', '0,400 mm,0')
        $piped.Count | Should -Be 2
        $piped[0].PeakFluxDensityTesla | Should -Be $given[0].PeakFluxDensityTesla
        $piped[1].PeakFluxDensityTesla | Should -Be $given[1].PeakFluxDensityTesla
        $errs = $null
        $rest = @('1 parsec, 0, 0', '100 mm, 0, 0' | Get-FieldStrength -Source $line -ErrorVariable errs -ErrorAction SilentlyContinue)
        $rest.Count | Should -Be 1
        $errs.Count | Should -Be 1
        "$($errs[0])" | Should -BeLike 'Position:*parsec*'
    }

    It 'takes several points given at once to -InputObject in turn, as piped; a $null is its row''s error and the rest go on' {
        $given = @(Get-FieldStrength -Source $line -Position '100 mm,0,0', '0,400 mm,0')
        $row = [pscustomobject]@{ X = '100 mm'; Y = '0 mm'; Z = '0 mm' }
        foreach ($run in @(
                @{ Name = 'given at once'; Out = { Get-FieldStrength -Source $line -InputObject $row, $null, '0, 0.4, 0' -ErrorVariable script:bad -ErrorAction SilentlyContinue } },
                @{ Name = 'piped'; Out = { $row, $null, '0, 0.4, 0' | Get-FieldStrength -Source $line -ErrorVariable script:bad -ErrorAction SilentlyContinue } })) {
            $script:bad = $null
            $out = @(& $run.Out)
            $out.PeakFluxDensityTesla | Should -Be $given.PeakFluxDensityTesla -Because $run.Name
            @($script:bad).Count | Should -Be 1 -Because $run.Name
            "$($script:bad[0])" | Should -Match '^row 2: InputObject: is \$null' -Because $run.Name
        }
    }

    # Validates: the cmdlet's resultant rms of a line's 50 Hz field, its peak over root 2 | Ampere's law | 1e-12
    It 'gives a sinusoid''s resultant rms: a line''s peak over root 2, more than that beside a three-phase set, none for a ramp' {
        $s = Get-FieldStrength -Source $line -Position '100 mm,0,0'
        [math]::Abs($s.RmsFluxDensityTesla / ($mu0 * 1000 / (2 * [math]::PI * 0.1) / [math]::Sqrt(2)) - 1) | Should -BeLessThan 1e-12 -Because 'a field of one direction: its peak over root 2, by Ampere''s law'
        $set = New-FieldWaveform -Sine -Amplitude '1 kA' -Frequency '50 Hz' | New-FieldSource -ThreePhase -Spacing '100 mm'
        $turning = Get-FieldStrength -Source $set -Position '0, 50 mm, 0'
        $turning.RmsFluxDensityTesla | Should -BeGreaterThan (1.3 * $turning.PeakFluxDensityTesla / [math]::Sqrt(2))
        $turning.RmsFluxDensityTesla | Should -BeLessOrEqual (1.0000001 * $turning.PeakFluxDensityTesla) -Because 'at most root 2 times the peak over root 2'
        ($turning | Out-String) | Should -Match 'Rms B'
        $ramp = New-FieldWaveform -Ramp -From 0 -To '1 kA' -Duration '1 s' | New-FieldSource -Conductor -Axis z
        (Get-FieldStrength -Source $ramp -Position '100 mm,0,0').RmsFluxDensityTesla | Should -BeNullOrEmpty
    }

    It 'reads points from rows with X, Y, Z and sums several sources' {
        $return = New-FieldWaveform -Sine -Amplitude '1 kA' -Frequency '50 Hz' -PhaseDegrees 180 | New-FieldSource -Conductor -Axis z -Center '20 mm,0,0'
        $one = @{ X = '200 mm'; Y = 0; Z = 0 } | Get-FieldStrength -Source $line
        $pair = @{ X = '200 mm'; Y = 0; Z = 0 } | Get-FieldStrength -Source $line, $return
        $pair.PeakFluxDensityTesla | Should -BeLessThan (0.2 * $one.PeakFluxDensityTesla) -Because 'a go-and-return pair cancels far away'
        (@{ Position = '200 mm, 0, 0' } | Get-FieldStrength -Source $line).PeakFluxDensityTesla | Should -Be $one.PeakFluxDensityTesla -Because 'one Position column is the same point as X, Y, Z'
        (@{ 'Position (mm)' = '200, 0, 0' } | Get-FieldStrength -Source $line).PeakFluxDensityTesla | Should -Be $one.PeakFluxDensityTesla
    }

    It 'writes an error naming the point on a conductor, and goes on' {
        $s = @(Get-FieldStrength -Source $line -Position '0,0,1', '0.1,0,0' -ErrorVariable bad -ErrorAction SilentlyContinue)
        $s.Count | Should -Be 1
        $bad.Count | Should -Be 1
        $bad[0].Exception.Message | Should -BeLike 'Position:*on the conductor*'
    }
}
