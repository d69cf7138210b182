package org.foldbook.model;

import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.Date;

/**
 * Builds notebooks for tests. CLEARLY SYNTHETIC: a made-up bench scenario (devices, serials, dates
 * are invented for the tests, not taken from any real lab or data sheet). Every call gives a new,
 * independent notebook.
 */
public final class SyntheticNotebooks {

    private SyntheticNotebooks() {
    }

    public static Date day(int year, int month, int dayOfMonth) {
        return Date.from(LocalDate.of(year, month, dayOfMonth).atStartOfDay(ZoneOffset.UTC).toInstant());
    }

    /**
     * A complete notebook using every class and attribute: a vibration chain (accelerometer →
     * conditioner → 4th-order Butterworth at 4 kHz → digitizer at 20 kS/s), a camera chain at 120 frames/s,
     * one experiment with a two-channel WAV recording and a sweep plan.
     */
    public static Notebook bench() {
        NotebookFactory f = NotebookFactory.eINSTANCE;
        Notebook notebook = f.createNotebook();
        notebook.setTitle("Synthetic bench notebook");
        notebook.setOwningGroup("Test group (synthetic)");

        Sensor accelerometer = f.createSensor();
        accelerometer.setId("ACC-1");
        accelerometer.setModelName("synthetic accelerometer A");
        accelerometer.setSerialNumber("S-0001");
        accelerometer.setCalibrationDate(day(2026, 1, 10));
        accelerometer.setNotes("stud mounted");
        accelerometer.setQuantity("acceleration");
        accelerometer.setUnit("m/s^2");
        accelerometer.setSensitivity(10.2);
        accelerometer.setSensitivityUnit("mV/(m/s^2)");
        accelerometer.setUsableMinHz(0.5);
        accelerometer.setUsableMaxHz(8000.0);
        accelerometer.setResonanceHz(9000.0);

        Amplifier conditioner = f.createAmplifier();
        conditioner.setId("AMP-1");
        conditioner.setModelName("synthetic conditioner");
        conditioner.setSerialNumber("S-0002");
        conditioner.getGainSettings().addAll(java.util.List.of(1.0, 10.0, 100.0));
        conditioner.setBandwidthLowHz(0.1);
        conditioner.setBandwidthHighHz(50000.0);

        AntiAliasFilter lowPass = f.createAntiAliasFilter();
        lowPass.setId("LP-1");
        lowPass.setModelName("synthetic low-pass");
        lowPass.setFamily(FilterFamily.BUTTERWORTH);
        lowPass.setOrder(4);
        lowPass.setCutoffHz(4000.0);
        lowPass.setAdjustable(true);

        Digitizer digitizer = f.createDigitizer();
        digitizer.setId("ADC-1");
        digitizer.setModelName("synthetic digitizer");
        digitizer.setSerialNumber("S-0003");
        digitizer.setResolutionBits(24);
        digitizer.getInputRangesV().addAll(java.util.List.of(1.0, 10.0));
        digitizer.setMaxRateHz(51200.0);
        digitizer.setDigitalFilter(false);

        Camera camera = f.createCamera();
        camera.setId("CAM-1");
        camera.setModelName("synthetic camera");
        camera.getFrameRatesHz().addAll(java.util.List.of(60.0, 120.0, 240.0));
        camera.setExposureS(0.002);

        notebook.getDevices().addAll(java.util.List.of(accelerometer, conditioner, lowPass, digitizer, camera));

        Rig rig = f.createRig();
        rig.setId("RIG-A");
        rig.setName("bench A");
        rig.setValidFrom(day(2026, 1, 1));
        rig.setValidUntil(day(2026, 12, 31));
        rig.setNotes("synthetic rig");

        SignalChain vibration = f.createSignalChain();
        vibration.setId("CH-VIB");
        vibration.setName("vibration Z");
        vibration.getStages().add(stage(accelerometer));
        Stage gain = stage(conditioner);
        gain.setGain(10.0);
        vibration.getStages().add(gain);
        Stage filter = stage(lowPass);
        filter.setCutoffHz(4000.0);
        vibration.getStages().add(filter);
        Stage sampler = stage(digitizer);
        sampler.setRateHz(20000.0);
        sampler.setRangeV(10.0);
        vibration.getStages().add(sampler);

        SignalChain video = f.createSignalChain();
        video.setId("CH-VID");
        video.setName("video");
        Stage frames = stage(camera);
        frames.setRateHz(120.0);
        frames.setExposureS(0.004);
        video.getStages().add(frames);
        rig.getChains().addAll(java.util.List.of(vibration, video));
        notebook.getRigs().add(rig);

        Experiment experiment = f.createExperiment();
        experiment.setName("run 1");
        experiment.setDate(day(2026, 3, 15));
        experiment.setOperator("operator (synthetic)");
        experiment.setPurpose("check the plate's first modes");
        experiment.setNotes("room 21 °C");
        experiment.setRig(rig);

        Recording recording = f.createRecording();
        recording.setId("REC-1");
        recording.setPath("data/run1.wav");
        recording.setFormat(RecordingFormat.WAV);
        recording.setDeclaredRateHz(20000.0);
        recording.setChannelCount(2);
        recording.setSizeBytes(80044L);
        recording.setSha256("e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855");
        experiment.getRecordings().add(recording);

        Channel channel = f.createChannel();
        channel.setName("plate Z");
        channel.setChain(vibration);
        channel.setRecording(recording);
        channel.setChannelIndex(1);
        channel.setQuantity("acceleration");
        channel.setUnit("m/s^2");
        SweepPlan plan = f.createSweepPlan();
        plan.setMinRateHz(2000.0);
        plan.setMaxRateHz(20000.0);
        plan.setRateCount(16);
        plan.setSpacing(RateSpacing.GEOMETRIC);
        plan.getModes().addAll(java.util.List.of(SweepMode.BARE, SweepMode.MODELLED));
        plan.setWindow(WindowKind.HANN);
        plan.setSegmentLength(4096);
        channel.setSweepPlan(plan);
        experiment.getChannels().add(channel);
        notebook.getExperiments().add(experiment);
        return notebook;
    }

    public static Stage stage(Device device) {
        Stage stage = NotebookFactory.eINSTANCE.createStage();
        stage.setDevice(device);
        return stage;
    }

    /** The bench notebook's vibration chain. */
    public static SignalChain vibrationChain(Notebook notebook) {
        return notebook.getRigs().get(0).getChains().get(0);
    }

    /** The bench notebook's camera chain. */
    public static SignalChain videoChain(Notebook notebook) {
        return notebook.getRigs().get(0).getChains().get(1);
    }
}
