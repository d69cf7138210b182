package org.foldbook.demo;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.Date;
import java.util.List;

import org.foldbook.io.Sha256;
import org.foldbook.model.Amplifier;
import org.foldbook.model.AntiAliasFilter;
import org.foldbook.model.Camera;
import org.foldbook.model.Channel;
import org.foldbook.model.Device;
import org.foldbook.model.Digitizer;
import org.foldbook.model.Experiment;
import org.foldbook.model.FilterFamily;
import org.foldbook.model.Notebook;
import org.foldbook.model.NotebookFactory;
import org.foldbook.model.Recording;
import org.foldbook.model.RecordingFormat;
import org.foldbook.model.Rig;
import org.foldbook.model.Sensor;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.foldbook.model.derived.ChainFigures;
import org.foldbook.demo.SyntheticTones.Tone;
import org.foldbook.model.persistence.NotebookStore;
import org.foldbook.model.persistence.RecordingFiles;

/**
 * The demo notebook: a SYNTHETIC gearbox test stand made up for Foldbook (devices, serials, dates
 * and signals are invented; no real lab, product or data sheet). One rig with four chains:
 * <ol>
 * <li>housing accelerometer (flat to 20 kHz, mounted resonance 32 kHz, its ringing reaching the
 * digitizer at −30 dBFS) → charge amplifier → 4th-order Butterworth low-pass at 10 kHz → 24-bit
 * digitizer (110 dB dynamic range) at 25.6 kS/s. Filtered, but not enough: aliases must stay 80 dB
 * down (110 dB − 30 dB) and the filter gives 9.1 dB at 12.8 kHz, about 16 dB at 15.6 kHz (the image
 * of the cutoff); the validation says so and names the rate that would do (42 kS/s);</li>
 * <li>a second accelerometer through the same kind of chain, but its low-pass was in bypass during
 * the run: everything above 12.8 kHz folds (the notebook's validation warns);</li>
 * <li>a microphone (to 20 kHz) into a delta-sigma digitizer at 48 kS/s whose built-in digital
 * filter (100 dB from 0.547·fs) protects it: nothing the microphone passes folds;</li>
 * <li>a high-speed camera at 1000 frames/s watching a painted mark on the output shaft (0.8 ms
 * exposure of a 1 ms frame period);</li>
 * <li>the housing accelerometer recorded wide-band at 204.8 kS/s for a survey ({@link SurveyScenario}),
 * whose channel carries a sweep plan through the everyday chain 1.</li>
 * </ol>
 * Signals are tones of the shaft (24.5 Hz at 1470 rpm), the 37-tooth mesh (906.5 Hz) and its
 * harmonics, the accelerometers' resonance ringing at 32 kHz and an ultrasonic 30 kHz component at the
 * microphone, each passed through its chain's modelled magnitude response and sampled, with noise from
 * fixed seeds. Recordings are at most 2 s long.
 */
public final class GearboxDemo {

    /** File name of the demo notebook inside its folder. */
    public static final String NOTEBOOK_FILE = "gearbox-stand.foldbook";
    /** Sub-folder (relative to the notebook) holding the demo recordings. */
    public static final String DATA_FOLDER = "data";

    static final double SHAFT_HZ = 1470.0 / 60.0; // 24.5 Hz
    static final int PINION_TEETH = 37;
    static final double MESH_HZ = SHAFT_HZ * PINION_TEETH; // 906.5 Hz
    /** The mesh frequency, for tests outside this package. */
    public static final double MESH_HZ_FOR_TESTS = MESH_HZ;
    static final double RESONANCE_HZ = 32000.0;
    /** Quality factor of the accelerometers' mounted resonance (the scenario's value: a peak of about 28 dB). */
    static final double RESONANCE_Q = 25.0;
    static final double VIBRATION_RATE_HZ = 25600.0;
    static final double SOUND_RATE_HZ = 48000.0;
    static final double FRAME_RATE_HZ = 1000.0;
    static final double SECONDS = 2.0;
    /** Level of the accelerometers' 32 kHz resonance ringing at the digitizer input (the scenario's "measured" value). */
    static final double RINGING_DBFS = -30.0;
    /** Dynamic range the scenario's data sheet gives for the 24-bit digitizer (dB, full scale to noise). */
    static final double DAQ_DYNAMIC_RANGE_DB = 110.0;

    /** The conditioners' analog noise over their band, as a full-scale fraction (−50 dBFS rms). */
    static final double ANALOG_NOISE_RMS = 0.00316;

    private GearboxDemo() {
    }

    /**
     * Writes the demo into {@code folder} (created if missing): the recordings under {@code data/} and
     * the notebook {@value #NOTEBOOK_FILE}, saved atomically, with each recording's size and SHA-256
     * logged. Existing demo files there are overwritten. Returns the notebook file.
     */
    public static Path write(Path folder) throws IOException {
        if (folder == null) {
            throw new IllegalArgumentException("folder must not be null");
        }
        Path notebookFile = folder.toAbsolutePath().normalize().resolve(NOTEBOOK_FILE);
        Files.createDirectories(notebookFile.resolveSibling(DATA_FOLDER));
        Notebook notebook = build();
        for (Experiment experiment : notebook.getExperiments()) {
            for (Recording recording : experiment.getRecordings()) {
                Path data = notebookFile.getParent().resolve(recording.getPath());
                long size = PcmWavWriter.write(data, (int) recording.getDeclaredRateHz(), bitsOf(recording),
                        signalsOf(experiment, recording));
                recording.setSizeBytes(size);
                recording.setSha256(Sha256.ofFile(data));
                if (!RecordingFiles.relativeTo(notebookFile, data).equals(recording.getPath())) {
                    throw new IllegalStateException("recording path " + recording.getPath() + " is not relative");
                }
            }
        }
        NotebookStore.save(notebook, notebookFile);
        return notebookFile;
    }

    /** The demo notebook's model, without files: sizes and checksums are logged by {@link #write}. */
    public static Notebook build() {
        NotebookFactory f = NotebookFactory.eINSTANCE;
        Notebook notebook = f.createNotebook();
        notebook.setTitle("Gearbox test stand GB-2 (demo, synthetic data)");
        notebook.setOwningGroup("Foldbook demo: drive-train group (invented)");

        Sensor accHousing = sensor("ACC-H1", "triaxial accelerometer, Z axis", "DEMO-A-4417");
        Sensor accBearing = sensor("ACC-B2", "triaxial accelerometer, Z axis", "DEMO-A-4418");
        Sensor microphone = f.createSensor();
        microphone.setId("MIC-1");
        microphone.setModelName("1/2-inch free-field microphone");
        microphone.setSerialNumber("DEMO-M-0912");
        microphone.setQuantity("sound pressure");
        microphone.setUnit("Pa");
        microphone.setSensitivity(50.0);
        microphone.setSensitivityUnit("mV/Pa");
        microphone.setUsableMinHz(20.0);
        microphone.setUsableMaxHz(20000.0);
        microphone.setCalibrationDate(day(2026, 2, 20));

        Amplifier charge = f.createAmplifier();
        charge.setId("CAMP-2");
        charge.setModelName("two-channel charge amplifier");
        charge.setSerialNumber("DEMO-C-0077");
        charge.getGainSettings().addAll(List.of(1.0, 10.0, 100.0));
        charge.setBandwidthLowHz(0.3);
        charge.setBandwidthHighHz(100000.0);

        AntiAliasFilter lowPassA = lowPass("LP-A", "DEMO-F-1201", FilterFamily.BUTTERWORTH,
                "channel A of the filter unit");
        AntiAliasFilter lowPassB = lowPass("LP-B", "DEMO-F-1201", FilterFamily.NONE,
                "channel B of the filter unit: its front-panel bypass was on during run 1 (found afterwards)");

        Digitizer daq = f.createDigitizer();
        daq.setId("DAQ-8");
        daq.setModelName("8-channel 24-bit digitizer, analog front end only");
        daq.setSerialNumber("DEMO-D-3310");
        daq.setResolutionBits(24);
        daq.getInputRangesV().addAll(List.of(1.0, 10.0));
        daq.setMaxRateHz(51200.0);
        daq.setDigitalFilter(false);
        daq.setDynamicRangeDb(DAQ_DYNAMIC_RANGE_DB);

        Digitizer soundCard = f.createDigitizer();
        soundCard.setId("DS-2");
        soundCard.setModelName("2-channel delta-sigma audio digitizer");
        soundCard.setSerialNumber("DEMO-S-5521");
        soundCard.setResolutionBits(24);
        soundCard.getInputRangesV().add(2.0);
        soundCard.setMaxRateHz(48000.0);
        soundCard.setDigitalFilter(true);
        soundCard.setPassbandFraction(0.453);
        soundCard.setStopbandFraction(0.547);
        soundCard.setStopbandAttenuationDb(100.0);
        soundCard.setDynamicRangeDb(105.0);

        Camera camera = f.createCamera();
        camera.setId("CAM-HS");
        camera.setModelName("monochrome high-speed camera");
        camera.setSerialNumber("DEMO-V-0042");
        camera.getFrameRatesHz().addAll(List.of(500.0, 1000.0, 2000.0, 4000.0));
        camera.setExposureS(0.0005);

        notebook.getDevices().addAll(List.<Device>of(accHousing, accBearing, microphone, charge, lowPassA, lowPassB,
                daq, soundCard, camera));

        Rig rig = f.createRig();
        rig.setId("GB-2");
        rig.setName("gearbox stand GB-2");
        rig.setValidFrom(day(2026, 3, 1));
        rig.setValidUntil(day(2026, 12, 31));
        rig.setNotes("Rotating machinery: guards closed and interlocked before the drive is enabled; "
                + "the charge amplifier and filter unit are mains-powered. Follow the stand's local rules.");

        SignalChain housing = chain("CH-HZ", "housing Z, filtered");
        housing.getStages().add(stage(accHousing));
        housing.getStages().add(gainStage(charge, 10.0));
        Stage filterA = stage(lowPassA);
        filterA.setCutoffHz(10000.0);
        housing.getStages().add(filterA);
        housing.getStages().add(samplerStage(daq, VIBRATION_RATE_HZ, 10.0));
        housing.setOutOfBandLevelDbfs(RINGING_DBFS);

        SignalChain bearing = chain("CH-BZ", "bearing Z, filter bypassed");
        bearing.getStages().add(stage(accBearing));
        bearing.getStages().add(gainStage(charge, 10.0));
        bearing.getStages().add(stage(lowPassB));
        bearing.getStages().add(samplerStage(daq, VIBRATION_RATE_HZ, 10.0));
        bearing.setOutOfBandLevelDbfs(RINGING_DBFS);

        SignalChain sound = chain("CH-MIC", "sound at 0.5 m");
        sound.getStages().add(stage(microphone));
        sound.getStages().add(samplerStage(soundCard, SOUND_RATE_HZ, 2.0));

        SignalChain shaftCamera = chain("CH-CAM", "shaft mark camera");
        Stage frames = stage(camera);
        frames.setRateHz(FRAME_RATE_HZ);
        frames.setExposureS(0.0008);
        frames.setFilmedRotationHz(SHAFT_HZ); // the output shaft, one painted mark
        frames.setFilmedMarksPerTurn(1);
        shaftCamera.getStages().add(frames);

        rig.getChains().addAll(List.of(housing, bearing, sound, shaftCamera));
        notebook.getRigs().add(rig);

        Experiment run = f.createExperiment();
        run.setName("run 1: 1470 rpm, 60 % load");
        run.setDate(day(2026, 4, 14));
        run.setOperator("demo operator");
        run.setPurpose("Mesh and bearing vibration at steady speed; sound at 0.5 m");
        run.setNotes("SYNTHETIC demo data generated by Foldbook's GearboxDemo, not a measurement.");
        run.setRig(rig);
        Recording vibration = recording("REC-VIB", "vibration-run1.wav", VIBRATION_RATE_HZ, 2);
        Recording audio = recording("REC-MIC", "sound-run1.wav", SOUND_RATE_HZ, 1);
        run.getRecordings().addAll(List.of(vibration, audio));
        run.getChannels().add(channel("housing Z", housing, vibration, 0, "acceleration", "m/s^2"));
        run.getChannels().add(channel("bearing Z", bearing, vibration, 1, "acceleration", "m/s^2"));
        run.getChannels().add(channel("sound 0.5 m", sound, audio, 0, "sound pressure", "Pa"));

        Experiment strobe = f.createExperiment();
        strobe.setName("run 2: shaft mark at 1000 frames/s");
        strobe.setDate(day(2026, 4, 14));
        strobe.setOperator("demo operator");
        strobe.setPurpose("Shaft speed from the mark's brightness, frame by frame");
        strobe.setNotes("SYNTHETIC demo data generated by Foldbook's GearboxDemo, not a measurement.");
        strobe.setRig(rig);
        Recording mark = recording("REC-CAM", "shaft-mark-run2.wav", FRAME_RATE_HZ, 1);
        strobe.getRecordings().add(mark);
        strobe.getChannels().add(channel("mark brightness", shaftCamera, mark, 0, "brightness", "1"));

        notebook.getExperiments().addAll(List.of(run, strobe));
        SurveyScenario.addTo(notebook, rig, accHousing, charge, housing);
        return notebook;
    }

    /** WAV sample size of a demo recording: the mark brightness is 16-bit, the rest 24-bit. */
    static int bitsOf(Recording recording) {
        return "REC-CAM".equals(recording.getId()) ? 16 : 24;
    }

    /** The recording's channels (full-scale fractions), each rendered through its channel's chain. */
    static double[][] signalsOf(Experiment experiment, Recording recording) {
        double seconds = SurveyScenario.RECORDING_ID.equals(recording.getId()) ? SurveyScenario.SECONDS : SECONDS;
        int frames = (int) Math.round(seconds * recording.getDeclaredRateHz());
        double[][] out = new double[recording.getChannelCount()][];
        for (Channel channel : experiment.getChannels()) {
            if (channel.getRecording() == recording) {
                SignalChain chain = channel.getChain();
                out[channel.getChannelIndex()] = SyntheticTones.render(tonesOf(chain), ChainFigures.chainResponse(chain),
                        recording.getDeclaredRateHz(), frames, noiseOf(chain), seedOf(chain));
            }
        }
        for (int c = 0; c < out.length; c++) {
            if (out[c] == null) {
                throw new IllegalStateException(recording.getId() + ": no channel for index " + c);
            }
        }
        return out;
    }

    /** What reaches each chain's front end, as full-scale fractions before the chain's filters. */
    static Tone[] tonesOf(SignalChain chain) {
        List<Tone> tones = new ArrayList<>();
        switch (chain.getId()) {
            case "CH-HZ", "CH-BZ" -> {
                tones.add(new Tone(SHAFT_HZ, 0.04, 0.3));
                tones.add(new Tone(MESH_HZ - SHAFT_HZ, 0.03, 1.1));
                tones.add(new Tone(MESH_HZ, 0.30, 0.0));
                tones.add(new Tone(MESH_HZ + SHAFT_HZ, 0.03, 2.0));
                tones.add(new Tone(2 * MESH_HZ, 0.12, 0.7));
                tones.add(new Tone(3 * MESH_HZ, 0.05, 1.9));
                tones.add(new Tone(17 * MESH_HZ, 0.02, 0.4)); // 15.41 kHz, −34 dBFS: above Nyquist at 25.6 kS/s
                // mounted resonance rung by tooth impacts: the strongest content above Nyquist
                tones.add(new Tone(RESONANCE_HZ, Math.pow(10, RINGING_DBFS / 20), 2.6));
            }
            case "CH-MIC" -> {
                tones.add(new Tone(MESH_HZ, 0.20, 0.5));
                tones.add(new Tone(2 * MESH_HZ, 0.08, 1.4));
                tones.add(new Tone(3 * MESH_HZ, 0.03, 0.2));
                tones.add(new Tone(30000.0, 0.10, 0.9)); // ultrasonic hiss of the drive's inverter
            }
            case SurveyScenario.CHAIN_ID -> tones.addAll(List.of(SurveyScenario.tones()));
            case "CH-CAM" -> {
                for (int k = 1; k <= 12; k++) { // a narrow bright mark: a pulse train at the shaft rate
                    tones.add(new Tone(k * SHAFT_HZ, 0.5 / k, 0.0));
                }
            }
            default -> throw new IllegalArgumentException("chain id '" + chain.getId() + "' is not a demo chain");
        }
        return tones.toArray(Tone[]::new);
    }

    /**
     * The scenario's noise: a camera's read noise is white per frame; an electrical chain has its
     * conditioner's analog noise (white to the amplifier's upper edge, else to twice the rate) that passes
     * the chain's filters and folds as it is sampled, and the digitizer's own white floor from its stated
     * dynamic range (full-scale sine to noise: rms = 10^(−DR/20)/√2).
     */
    static SyntheticTones.Noise noiseOf(SignalChain chain) {
        if ("CH-CAM".equals(chain.getId())) {
            return SyntheticTones.Noise.white(0.01);
        }
        double band = 2 * ChainFigures.samplingRateHz(chain);
        double dynamicRangeDb = 144.0;
        for (Stage stage : chain.getStages()) {
            if (stage.getDevice() instanceof Amplifier amplifier && amplifier.getBandwidthHighHz() != null) {
                band = amplifier.getBandwidthHighHz();
            }
            if (stage.getDevice() instanceof Digitizer digitizer && digitizer.getDynamicRangeDb() != null) {
                dynamicRangeDb = digitizer.getDynamicRangeDb();
            }
        }
        return new SyntheticTones.Noise(ANALOG_NOISE_RMS, band, Math.pow(10, -dynamicRangeDb / 20) / Math.sqrt(2));
    }

    private static long seedOf(SignalChain chain) {
        return switch (chain.getId()) {
            case "CH-HZ" -> 20260414L;
            case "CH-BZ" -> 20260415L;
            case "CH-MIC" -> 20260416L;
            case SurveyScenario.CHAIN_ID -> 20260418L;
            default -> 20260417L;
        };
    }

    private static Sensor sensor(String id, String model, String serial) {
        Sensor s = NotebookFactory.eINSTANCE.createSensor();
        s.setId(id);
        s.setModelName(model);
        s.setSerialNumber(serial);
        s.setQuantity("acceleration");
        s.setUnit("m/s^2");
        s.setSensitivity(1.02);
        s.setSensitivityUnit("pC/(m/s^2)");
        s.setUsableMinHz(1.0);
        s.setUsableMaxHz(20000.0);
        s.setResonanceHz(RESONANCE_HZ);
        s.setResonanceQ(RESONANCE_Q);
        s.setCalibrationDate(day(2026, 1, 12));
        s.setNotes("stud mounted on a spot-faced pad");
        return s;
    }

    private static AntiAliasFilter lowPass(String id, String serial, FilterFamily family, String notes) {
        AntiAliasFilter filter = NotebookFactory.eINSTANCE.createAntiAliasFilter();
        filter.setId(id);
        filter.setModelName("switchable low-pass unit");
        filter.setSerialNumber(serial);
        filter.setFamily(family);
        filter.setOrder(family == FilterFamily.NONE ? 0 : 4);
        filter.setCutoffHz(10000.0);
        filter.setAdjustable(true);
        filter.setNotes(notes);
        return filter;
    }

    private static SignalChain chain(String id, String name) {
        SignalChain chain = NotebookFactory.eINSTANCE.createSignalChain();
        chain.setId(id);
        chain.setName(name);
        return chain;
    }

    private static Stage stage(Device device) {
        Stage stage = NotebookFactory.eINSTANCE.createStage();
        stage.setDevice(device);
        return stage;
    }

    private static Stage gainStage(Amplifier amplifier, double gain) {
        Stage stage = stage(amplifier);
        stage.setGain(gain);
        return stage;
    }

    private static Stage samplerStage(Digitizer digitizer, double rateHz, double rangeV) {
        Stage stage = stage(digitizer);
        stage.setRateHz(rateHz);
        stage.setRangeV(rangeV);
        return stage;
    }

    private static Recording recording(String id, String file, double rateHz, int channels) {
        Recording r = NotebookFactory.eINSTANCE.createRecording();
        r.setId(id);
        r.setPath(DATA_FOLDER + "/" + file);
        r.setFormat(RecordingFormat.WAV);
        r.setDeclaredRateHz(rateHz);
        r.setChannelCount(channels);
        return r;
    }

    private static Channel channel(String name, SignalChain chain, Recording recording, int index, String quantity,
            String unit) {
        Channel c = NotebookFactory.eINSTANCE.createChannel();
        c.setName(name);
        c.setChain(chain);
        c.setRecording(recording);
        c.setChannelIndex(index);
        c.setQuantity(quantity);
        c.setUnit(unit);
        return c;
    }

    static Date day(int year, int month, int dayOfMonth) {
        return Date.from(LocalDate.of(year, month, dayOfMonth).atStartOfDay(ZoneOffset.UTC).toInstant());
    }
}
