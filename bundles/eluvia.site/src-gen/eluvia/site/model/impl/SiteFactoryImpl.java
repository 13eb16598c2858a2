/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.*;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EDataType;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EPackage;

import org.eclipse.emf.ecore.impl.EFactoryImpl;

import org.eclipse.emf.ecore.plugin.EcorePlugin;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model <b>Factory</b>.
 * <!-- end-user-doc -->
 * @generated
 */
public class SiteFactoryImpl extends EFactoryImpl implements SiteFactory {
	/**
	 * Creates the default factory implementation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static SiteFactory init() {
		try {
			SiteFactory theSiteFactory = (SiteFactory)EPackage.Registry.INSTANCE.getEFactory(SitePackage.eNS_URI);
			if (theSiteFactory != null) {
				return theSiteFactory;
			}
		}
		catch (Exception exception) {
			EcorePlugin.INSTANCE.log(exception);
		}
		return new SiteFactoryImpl();
	}

	/**
	 * Creates an instance of the factory.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public SiteFactoryImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EObject create(EClass eClass) {
		switch (eClass.getClassifierID()) {
			case SitePackage.PROJECT: return createProject();
			case SitePackage.SITE: return createSite();
			case SitePackage.SOIL_LAYER: return createSoilLayer();
			case SitePackage.CONTAMINANT: return createContaminant();
			case SitePackage.CLEANUP_LEVEL: return createCleanupLevel();
			case SitePackage.TREATMENT_ZONE: return createTreatmentZone();
			case SitePackage.SOURCE_CONCENTRATION: return createSourceConcentration();
			case SitePackage.FLUSHING_DESIGN: return createFlushingDesign();
			case SitePackage.REVISION: return createRevision();
			case SitePackage.VERTEX: return createVertex();
			case SitePackage.SAMPLING_LOCATION: return createSamplingLocation();
			case SitePackage.SAMPLE: return createSample();
			case SitePackage.EXCAVATION_DESIGN: return createExcavationDesign();
			case SitePackage.PRICE_BOOK: return createPriceBook();
			case SitePackage.PRICE_ITEM: return createPriceItem();
			case SitePackage.COLUMN_TEST: return createColumnTest();
			case SitePackage.COLUMN_TEST_POINT: return createColumnTestPoint();
			case SitePackage.UNCERTAINTY_SETTINGS: return createUncertaintySettings();
			case SitePackage.UNCERTAIN_INPUT: return createUncertainInput();
			case SitePackage.RANK_CORRELATION: return createRankCorrelation();
			case SitePackage.ZONE_ANALYSIS_SETTINGS: return createZoneAnalysisSettings();
			default:
				throw new IllegalArgumentException("The class '" + eClass.getName() + "' is not a valid classifier");
		}
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object createFromString(EDataType eDataType, String initialValue) {
		switch (eDataType.getClassifierID()) {
			case SitePackage.COMPLIANCE_CRITERION:
				return createComplianceCriterionFromString(eDataType, initialValue);
			case SitePackage.UNIT_SYSTEM:
				return createUnitSystemFromString(eDataType, initialValue);
			case SitePackage.DISPERSIVITY_RULE:
				return createDispersivityRuleFromString(eDataType, initialValue);
			case SitePackage.SORPTION_ISOTHERM:
				return createSorptionIsothermFromString(eDataType, initialValue);
			case SitePackage.NONEQUILIBRIUM_ENTRY:
				return createNonequilibriumEntryFromString(eDataType, initialValue);
			case SitePackage.COMPLIANCE_STATISTIC:
				return createComplianceStatisticFromString(eDataType, initialValue);
			case SitePackage.SOLUTION_METHOD:
				return createSolutionMethodFromString(eDataType, initialValue);
			case SitePackage.EXCAVATION_SOIL_TYPE:
				return createExcavationSoilTypeFromString(eDataType, initialValue);
			case SitePackage.COLUMN_TEST_KIND:
				return createColumnTestKindFromString(eDataType, initialValue);
			case SitePackage.UNCERTAINTY_SAMPLING:
				return createUncertaintySamplingFromString(eDataType, initialValue);
			case SitePackage.INPUT_DISTRIBUTION_KIND:
				return createInputDistributionKindFromString(eDataType, initialValue);
			case SitePackage.ZONE_ESTIMATOR_KIND:
				return createZoneEstimatorKindFromString(eDataType, initialValue);
			case SitePackage.NON_DETECT_VALUE:
				return createNonDetectValueFromString(eDataType, initialValue);
			case SitePackage.VARIOGRAM_SHAPE_KIND:
				return createVariogramShapeKindFromString(eDataType, initialValue);
			default:
				throw new IllegalArgumentException("The datatype '" + eDataType.getName() + "' is not a valid classifier");
		}
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String convertToString(EDataType eDataType, Object instanceValue) {
		switch (eDataType.getClassifierID()) {
			case SitePackage.COMPLIANCE_CRITERION:
				return convertComplianceCriterionToString(eDataType, instanceValue);
			case SitePackage.UNIT_SYSTEM:
				return convertUnitSystemToString(eDataType, instanceValue);
			case SitePackage.DISPERSIVITY_RULE:
				return convertDispersivityRuleToString(eDataType, instanceValue);
			case SitePackage.SORPTION_ISOTHERM:
				return convertSorptionIsothermToString(eDataType, instanceValue);
			case SitePackage.NONEQUILIBRIUM_ENTRY:
				return convertNonequilibriumEntryToString(eDataType, instanceValue);
			case SitePackage.COMPLIANCE_STATISTIC:
				return convertComplianceStatisticToString(eDataType, instanceValue);
			case SitePackage.SOLUTION_METHOD:
				return convertSolutionMethodToString(eDataType, instanceValue);
			case SitePackage.EXCAVATION_SOIL_TYPE:
				return convertExcavationSoilTypeToString(eDataType, instanceValue);
			case SitePackage.COLUMN_TEST_KIND:
				return convertColumnTestKindToString(eDataType, instanceValue);
			case SitePackage.UNCERTAINTY_SAMPLING:
				return convertUncertaintySamplingToString(eDataType, instanceValue);
			case SitePackage.INPUT_DISTRIBUTION_KIND:
				return convertInputDistributionKindToString(eDataType, instanceValue);
			case SitePackage.ZONE_ESTIMATOR_KIND:
				return convertZoneEstimatorKindToString(eDataType, instanceValue);
			case SitePackage.NON_DETECT_VALUE:
				return convertNonDetectValueToString(eDataType, instanceValue);
			case SitePackage.VARIOGRAM_SHAPE_KIND:
				return convertVariogramShapeKindToString(eDataType, instanceValue);
			default:
				throw new IllegalArgumentException("The datatype '" + eDataType.getName() + "' is not a valid classifier");
		}
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Project createProject() {
		ProjectImpl project = new ProjectImpl();
		return project;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Site createSite() {
		SiteImpl site = new SiteImpl();
		return site;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public SoilLayer createSoilLayer() {
		SoilLayerImpl soilLayer = new SoilLayerImpl();
		return soilLayer;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Contaminant createContaminant() {
		ContaminantImpl contaminant = new ContaminantImpl();
		return contaminant;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public CleanupLevel createCleanupLevel() {
		CleanupLevelImpl cleanupLevel = new CleanupLevelImpl();
		return cleanupLevel;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public TreatmentZone createTreatmentZone() {
		TreatmentZoneImpl treatmentZone = new TreatmentZoneImpl();
		return treatmentZone;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public SourceConcentration createSourceConcentration() {
		SourceConcentrationImpl sourceConcentration = new SourceConcentrationImpl();
		return sourceConcentration;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public FlushingDesign createFlushingDesign() {
		FlushingDesignImpl flushingDesign = new FlushingDesignImpl();
		return flushingDesign;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Revision createRevision() {
		RevisionImpl revision = new RevisionImpl();
		return revision;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Vertex createVertex() {
		VertexImpl vertex = new VertexImpl();
		return vertex;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public SamplingLocation createSamplingLocation() {
		SamplingLocationImpl samplingLocation = new SamplingLocationImpl();
		return samplingLocation;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Sample createSample() {
		SampleImpl sample = new SampleImpl();
		return sample;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ExcavationDesign createExcavationDesign() {
		ExcavationDesignImpl excavationDesign = new ExcavationDesignImpl();
		return excavationDesign;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public PriceBook createPriceBook() {
		PriceBookImpl priceBook = new PriceBookImpl();
		return priceBook;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public PriceItem createPriceItem() {
		PriceItemImpl priceItem = new PriceItemImpl();
		return priceItem;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ColumnTest createColumnTest() {
		ColumnTestImpl columnTest = new ColumnTestImpl();
		return columnTest;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ColumnTestPoint createColumnTestPoint() {
		ColumnTestPointImpl columnTestPoint = new ColumnTestPointImpl();
		return columnTestPoint;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public UncertaintySettings createUncertaintySettings() {
		UncertaintySettingsImpl uncertaintySettings = new UncertaintySettingsImpl();
		return uncertaintySettings;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public UncertainInput createUncertainInput() {
		UncertainInputImpl uncertainInput = new UncertainInputImpl();
		return uncertainInput;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public RankCorrelation createRankCorrelation() {
		RankCorrelationImpl rankCorrelation = new RankCorrelationImpl();
		return rankCorrelation;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ZoneAnalysisSettings createZoneAnalysisSettings() {
		ZoneAnalysisSettingsImpl zoneAnalysisSettings = new ZoneAnalysisSettingsImpl();
		return zoneAnalysisSettings;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public ComplianceCriterion createComplianceCriterionFromString(EDataType eDataType, String initialValue) {
		ComplianceCriterion result = ComplianceCriterion.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertComplianceCriterionToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public UnitSystem createUnitSystemFromString(EDataType eDataType, String initialValue) {
		UnitSystem result = UnitSystem.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertUnitSystemToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public DispersivityRule createDispersivityRuleFromString(EDataType eDataType, String initialValue) {
		DispersivityRule result = DispersivityRule.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertDispersivityRuleToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public SorptionIsotherm createSorptionIsothermFromString(EDataType eDataType, String initialValue) {
		SorptionIsotherm result = SorptionIsotherm.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertSorptionIsothermToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NonequilibriumEntry createNonequilibriumEntryFromString(EDataType eDataType, String initialValue) {
		NonequilibriumEntry result = NonequilibriumEntry.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertNonequilibriumEntryToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public ComplianceStatistic createComplianceStatisticFromString(EDataType eDataType, String initialValue) {
		ComplianceStatistic result = ComplianceStatistic.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertComplianceStatisticToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public SolutionMethod createSolutionMethodFromString(EDataType eDataType, String initialValue) {
		SolutionMethod result = SolutionMethod.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertSolutionMethodToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public ExcavationSoilType createExcavationSoilTypeFromString(EDataType eDataType, String initialValue) {
		ExcavationSoilType result = ExcavationSoilType.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertExcavationSoilTypeToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public ColumnTestKind createColumnTestKindFromString(EDataType eDataType, String initialValue) {
		ColumnTestKind result = ColumnTestKind.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertColumnTestKindToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public UncertaintySampling createUncertaintySamplingFromString(EDataType eDataType, String initialValue) {
		UncertaintySampling result = UncertaintySampling.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertUncertaintySamplingToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public InputDistributionKind createInputDistributionKindFromString(EDataType eDataType, String initialValue) {
		InputDistributionKind result = InputDistributionKind.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertInputDistributionKindToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public ZoneEstimatorKind createZoneEstimatorKindFromString(EDataType eDataType, String initialValue) {
		ZoneEstimatorKind result = ZoneEstimatorKind.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertZoneEstimatorKindToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NonDetectValue createNonDetectValueFromString(EDataType eDataType, String initialValue) {
		NonDetectValue result = NonDetectValue.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertNonDetectValueToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public VariogramShapeKind createVariogramShapeKindFromString(EDataType eDataType, String initialValue) {
		VariogramShapeKind result = VariogramShapeKind.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertVariogramShapeKindToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public SitePackage getSitePackage() {
		return (SitePackage)getEPackage();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @deprecated
	 * @generated
	 */
	@Deprecated
	public static SitePackage getPackage() {
		return SitePackage.eINSTANCE;
	}

} //SiteFactoryImpl
