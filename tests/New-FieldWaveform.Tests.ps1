param([string] $ModulePath = (Join-Path $PSScriptRoot '../out/InductionHazard/InductionHazard.psd1'))

BeforeAll { Import-Module $ModulePath -Force }

Describe 'New-FieldWaveform' {
    It 'reads a field or time as written, or refuses it saying why: <Text>' -ForEach @(
        @{ Text = '15 kG'; Peak = 1.5 }
        @{ Text = '150 G'; Peak = 0.015 }
        @{ Text = '2 mT'; Peak = 0.002 }
        @{ Text = '40 kA'; Peak = 40000 }
        @{ Text = '1,5 T'; Refusal = '*decimal comma*' }
        @{ Text = '10 MS'; Refusal = '*''MS'' is not a unit*' }
        @{ Text = '10 ms'; Refusal = '*which is a time*' }
    ) {
        if ($Refusal) { { New-FieldWaveform -Sine -Amplitude $Text -Frequency '50 Hz' } | Should -Throw -ExpectedMessage $Refusal }
        else { (New-FieldWaveform -Sine -Amplitude $Text -Frequency '50 Hz').PeakValue | Should -Be $Peak }
    }

    It 'makes a ramp from strings with units, including the ASCII spelling of micro' {
        $w = New-FieldWaveform -Ramp -From '0 T' -To '3 T' -Duration '10 us' -Start '1 ms'
        $w.Form | Should -Be 'Ramp'
        [math]::Abs($w.DurationSeconds - 1e-5) | Should -BeLessThan 1e-18
        [math]::Abs($w.StartSeconds - 1e-3) | Should -BeLessThan 1e-15
        [math]::Abs($w.PeakRate / 3e5 - 1) | Should -BeLessThan 1e-12
        $w.Drive | Should -Be 'FluxDensity'
    }

    It 'takes gauss and plain numbers in SI' {
        (New-FieldWaveform -Ramp -From 0 -To '150 G' -Duration 2).To | Should -Be 0.015
    }

    It 'makes a sine from an rms amplitude' {
        $w = New-FieldWaveform -Sine -RmsAmplitude '2 mT' -Frequency '12 kHz'
        $w.Amplitude | Should -BeGreaterThan 0.0028284
        $w.Amplitude | Should -BeLessThan 0.0028285
        $w.PeriodSeconds | Should -Be (1 / 12000)
        $w.Drive | Should -Be 'FluxDensity'
    }

    It 'makes a current waveform from amperes' {
        (New-FieldWaveform -Sine -Amplitude '40 kA' -Frequency '50 Hz').Drive | Should -Be 'Current'
    }

    It 'refuses a value of the wrong dimension, naming the parameter and what it expects' {
        { New-FieldWaveform -Ramp -From 0 -To '3 T' -Duration '3 T' } | Should -Throw -ExpectedMessage "*Duration*a time*'3 T'*magnetic flux density*"
    }

    It 'refuses a ramp from tesla to amperes' {
        { New-FieldWaveform -Ramp -From '0 T' -To '3 A' -Duration '1 s' } |
            Should -Throw -ErrorId 'InvalidInput,InductionHazard.PowerShell.Commands.NewFieldWaveformCommand'
    }

    It 'refuses a zero duration' {
        { New-FieldWaveform -Ramp -From 0 -To 1 -Duration 0 } | Should -Throw -ExpectedMessage '*Duration*greater than zero*'
    }

    It 'reads -PhaseDegrees as an angle: <Given> is <Degrees> degrees' -TestCases @(
        @{ Given = 90; Degrees = 90 }
        @{ Given = '90 deg'; Degrees = 90 }
        @{ Given = '3.141592653589793 rad'; Degrees = 180 }
    ) {
        $w = New-FieldWaveform -Sine -Amplitude '1 T' -Frequency '50 Hz' -PhaseDegrees $Given
        [math]::Abs($w.PhaseRadians - $Degrees * [math]::PI / 180) | Should -BeLessThan 1e-12
    }

    It 'refuses a -PhaseDegrees of <Shown> instead of reading it as a number' -TestCases @(
        @{ Given = ''; Shown = 'an empty string' }
        @{ Given = '0x10'; Shown = '0x10' }
        @{ Given = $true; Shown = 'True' }
    ) {
        { New-FieldWaveform -Sine -Amplitude '1 T' -Frequency '50 Hz' -PhaseDegrees $Given } | Should -Throw -ExpectedMessage '*PhaseDegrees*'
    }

    # Validates: kappa through the cmdlet | IEC 60909-0 | 2 %
    It 'makes an IEC 60909 fault whose worst first peak is kappa sqrt2 Ik''' {
        $f = New-FieldWaveform -Fault -Current '40 kA' -XOverR 14 -Frequency '50 Hz' -ClearingTime '200 ms'
        $kappa = 1.02 + 0.98 * [math]::Exp(-3 / 14)
        [math]::Abs($f.PeakFactor / $kappa - 1) | Should -BeLessThan 0.02
        $f.Drive | Should -Be 'Current'
        $f.Describe() | Should -Match 'the worst, by search'
    }

    It 'makes a crowbarred discharge train' {
        $w = New-FieldWaveform -Discharge -Capacitance '2 mF' -Voltage '5 kV' -Inductance '50 uH' -Resistance '30 mohm' -Crowbar -Repeat 3 -Period '10 s'
        $w.Form | Should -Be 'Discharge train'
        $w.Count | Should -Be 3
    }

    It 'reads a capture with a header, and names the line of a bad sample' {
        $good = Join-Path $TestDrive 'capture.csv'
        Set-Content $good -Value "Time (s),B (mT)`n0,0`n0.001,40`n0.002,0"
        $w = New-FieldWaveform -Path $good -Unit mT
        $w.SampleCount | Should -Be 3
        [math]::Abs($w.PeakValue - 0.04) | Should -BeLessThan 1e-15
        $bad = Join-Path $TestDrive 'bad-capture.csv'
        Set-Content $bad -Value "Time (s),B (mT)`n0,0`n0.001,40`n0.0005,0"
        { New-FieldWaveform -Path $bad -Unit mT } | Should -Throw -ErrorId 'InvalidCapture,InductionHazard.PowerShell.Commands.NewFieldWaveformCommand' -ExpectedMessage '*line 4*strictly increasing*'
    }

    It 'refuses -Repeat without -Period' {
        { New-FieldWaveform -Trapezoid -Amplitude '1 T' -RiseTime '1 ms' -FallTime '1 ms' -Repeat 3 } | Should -Throw -ExpectedMessage '*Period*'
    }
}
