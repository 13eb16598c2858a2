/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.CleanupLevel;
import eluvia.site.model.ColumnTest;
import eluvia.site.model.ColumnTestKind;
import eluvia.site.model.ColumnTestPoint;
import eluvia.site.model.ComplianceCriterion;
import eluvia.site.model.ComplianceStatistic;
import eluvia.site.model.Contaminant;
import eluvia.site.model.DispersivityRule;
import eluvia.site.model.ExcavationDesign;
import eluvia.site.model.ExcavationSoilType;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.InputDistributionKind;
import eluvia.site.model.NonDetectValue;
import eluvia.site.model.NonequilibriumEntry;
import eluvia.site.model.PriceBook;
import eluvia.site.model.PriceItem;
import eluvia.site.model.Project;
import eluvia.site.model.RankCorrelation;
import eluvia.site.model.Revision;
import eluvia.site.model.Sample;
import eluvia.site.model.SamplingLocation;
import eluvia.site.model.Site;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SitePackage;
import eluvia.site.model.SoilLayer;
import eluvia.site.model.SolutionMethod;
import eluvia.site.model.SorptionIsotherm;
import eluvia.site.model.SourceConcentration;
import eluvia.site.model.TreatmentZone;

import eluvia.site.model.UncertainInput;
import eluvia.site.model.UncertaintySampling;
import eluvia.site.model.UncertaintySettings;
import eluvia.site.model.UnitSystem;
import eluvia.site.model.VariogramShapeKind;
import eluvia.site.model.Vertex;
import eluvia.site.model.ZoneAnalysisSettings;
import eluvia.site.model.ZoneEstimatorKind;
import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EEnum;
import org.eclipse.emf.ecore.EPackage;
import org.eclipse.emf.ecore.EReference;

import org.eclipse.emf.ecore.impl.EPackageImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model <b>Package</b>.
 * <!-- end-user-doc -->
 * @generated
 */
public class SitePackageImpl extends EPackageImpl implements SitePackage {
	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass projectEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass siteEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass soilLayerEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass contaminantEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass cleanupLevelEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass treatmentZoneEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass sourceConcentrationEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass flushingDesignEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass revisionEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass vertexEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass samplingLocationEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass sampleEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass excavationDesignEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass priceBookEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass priceItemEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass columnTestEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass columnTestPointEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass uncertaintySettingsEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass uncertainInputEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass rankCorrelationEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass zoneAnalysisSettingsEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum complianceCriterionEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum unitSystemEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum dispersivityRuleEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum sorptionIsothermEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum nonequilibriumEntryEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum complianceStatisticEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum solutionMethodEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum excavationSoilTypeEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum columnTestKindEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum uncertaintySamplingEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum inputDistributionKindEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum zoneEstimatorKindEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum nonDetectValueEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum variogramShapeKindEEnum = null;

	/**
	 * Creates an instance of the model <b>Package</b>, registered with
	 * {@link org.eclipse.emf.ecore.EPackage.Registry EPackage.Registry} by the package
	 * package URI value.
	 * <p>Note: the correct way to create the package is via the static
	 * factory method {@link #init init()}, which also performs
	 * initialization of the package, or returns the registered package,
	 * if one already exists.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.eclipse.emf.ecore.EPackage.Registry
	 * @see eluvia.site.model.SitePackage#eNS_URI
	 * @see #init()
	 * @generated
	 */
	private SitePackageImpl() {
		super(eNS_URI, SiteFactory.eINSTANCE);
	}
	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static boolean isInited = false;

	/**
	 * Creates, registers, and initializes the <b>Package</b> for this model, and for any others upon which it depends.
	 *
	 * <p>This method is used to initialize {@link SitePackage#eINSTANCE} when that field is accessed.
	 * Clients should not invoke it directly. Instead, they should simply access that field to obtain the package.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #eNS_URI
	 * @see #createPackageContents()
	 * @see #initializePackageContents()
	 * @generated
	 */
	public static SitePackage init() {
		if (isInited) return (SitePackage)EPackage.Registry.INSTANCE.getEPackage(SitePackage.eNS_URI);

		// Obtain or create and register package
		Object registeredSitePackage = EPackage.Registry.INSTANCE.get(eNS_URI);
		SitePackageImpl theSitePackage = registeredSitePackage instanceof SitePackageImpl ? (SitePackageImpl)registeredSitePackage : new SitePackageImpl();

		isInited = true;

		// Create package meta-data objects
		theSitePackage.createPackageContents();

		// Initialize created meta-data
		theSitePackage.initializePackageContents();

		// Mark meta-data to indicate it can't be changed
		theSitePackage.freeze();

		// Update the registry and return the package
		EPackage.Registry.INSTANCE.put(SitePackage.eNS_URI, theSitePackage);
		return theSitePackage;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getProject() {
		return projectEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getProject_Name() {
		return (EAttribute)projectEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getProject_Description() {
		return (EAttribute)projectEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getProject_SchemaVersion() {
		return (EAttribute)projectEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getProject_Site() {
		return (EReference)projectEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getProject_Contaminants() {
		return (EReference)projectEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getProject_CleanupLevels() {
		return (EReference)projectEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getProject_FlushingDesigns() {
		return (EReference)projectEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getProject_UnitSystem() {
		return (EAttribute)projectEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getProject_Revisions() {
		return (EReference)projectEClass.getEStructuralFeatures().get(8);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getProject_ExcavationDesigns() {
		return (EReference)projectEClass.getEStructuralFeatures().get(9);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getProject_PriceBooks() {
		return (EReference)projectEClass.getEStructuralFeatures().get(10);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getProject_ColumnTests() {
		return (EReference)projectEClass.getEStructuralFeatures().get(11);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getProject_Uncertainty() {
		return (EReference)projectEClass.getEStructuralFeatures().get(12);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getProject_ZoneAnalysis() {
		return (EReference)projectEClass.getEStructuralFeatures().get(13);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getSite() {
		return siteEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSite_Name() {
		return (EAttribute)siteEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSite_Description() {
		return (EAttribute)siteEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getSite_Layers() {
		return (EReference)siteEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getSite_Zones() {
		return (EReference)siteEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSite_CoordinateFrame() {
		return (EAttribute)siteEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSite_GroundSurfaceElevationMetres() {
		return (EAttribute)siteEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getSite_Boundary() {
		return (EReference)siteEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getSite_SamplingLocations() {
		return (EReference)siteEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getSoilLayer() {
		return soilLayerEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSoilLayer_Name() {
		return (EAttribute)soilLayerEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSoilLayer_TopDepthMetres() {
		return (EAttribute)soilLayerEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSoilLayer_BottomDepthMetres() {
		return (EAttribute)soilLayerEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSoilLayer_TextureClass() {
		return (EAttribute)soilLayerEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSoilLayer_BulkDensityKgPerCubicMetre() {
		return (EAttribute)soilLayerEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSoilLayer_Porosity() {
		return (EAttribute)soilLayerEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSoilLayer_WaterContent() {
		return (EAttribute)soilLayerEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSoilLayer_OrganicCarbonFraction() {
		return (EAttribute)soilLayerEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSoilLayer_SaturatedConductivityMetresPerDay() {
		return (EAttribute)soilLayerEClass.getEStructuralFeatures().get(8);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSoilLayer_DispersivityMetres() {
		return (EAttribute)soilLayerEClass.getEStructuralFeatures().get(9);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSoilLayer_SwellFactor() {
		return (EAttribute)soilLayerEClass.getEStructuralFeatures().get(10);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSoilLayer_ShrinkageFactor() {
		return (EAttribute)soilLayerEClass.getEStructuralFeatures().get(11);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSoilLayer_DispersivityRule() {
		return (EAttribute)soilLayerEClass.getEStructuralFeatures().get(12);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSoilLayer_DispersivityScaleMetres() {
		return (EAttribute)soilLayerEClass.getEStructuralFeatures().get(13);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSoilLayer_EffectiveDispersivityMetres() {
		return (EAttribute)soilLayerEClass.getEStructuralFeatures().get(14);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getContaminant() {
		return contaminantEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContaminant_Name() {
		return (EAttribute)contaminantEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContaminant_CasNumber() {
		return (EAttribute)contaminantEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContaminant_KocLitresPerKg() {
		return (EAttribute)contaminantEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContaminant_KdEntered() {
		return (EAttribute)contaminantEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContaminant_KdLitresPerKg() {
		return (EAttribute)contaminantEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContaminant_DiffusionSquareMetresPerSecond() {
		return (EAttribute)contaminantEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContaminant_HalfLifeDays() {
		return (EAttribute)contaminantEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContaminant_Isotherm() {
		return (EAttribute)contaminantEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContaminant_FreundlichKfMgPerKgPerMgPerLitreToN() {
		return (EAttribute)contaminantEClass.getEStructuralFeatures().get(8);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContaminant_FreundlichExponent() {
		return (EAttribute)contaminantEClass.getEStructuralFeatures().get(9);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContaminant_LangmuirMaximumMilligramsPerKg() {
		return (EAttribute)contaminantEClass.getEStructuralFeatures().get(10);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContaminant_LangmuirConstantLitresPerMilligram() {
		return (EAttribute)contaminantEClass.getEStructuralFeatures().get(11);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContaminant_WaterSolubilityMilligramsPerLitre() {
		return (EAttribute)contaminantEClass.getEStructuralFeatures().get(12);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContaminant_Nonequilibrium() {
		return (EAttribute)contaminantEClass.getEStructuralFeatures().get(13);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContaminant_Beta() {
		return (EAttribute)contaminantEClass.getEStructuralFeatures().get(14);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContaminant_Omega() {
		return (EAttribute)contaminantEClass.getEStructuralFeatures().get(15);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContaminant_MobileWaterFraction() {
		return (EAttribute)contaminantEClass.getEStructuralFeatures().get(16);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContaminant_MobileSiteFraction() {
		return (EAttribute)contaminantEClass.getEStructuralFeatures().get(17);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContaminant_MassTransferRatePerDay() {
		return (EAttribute)contaminantEClass.getEStructuralFeatures().get(18);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContaminant_PropertySource() {
		return (EAttribute)contaminantEClass.getEStructuralFeatures().get(19);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getCleanupLevel() {
		return cleanupLevelEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getCleanupLevel_Contaminant() {
		return (EReference)cleanupLevelEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCleanupLevel_SoilLevelMilligramsPerKg() {
		return (EAttribute)cleanupLevelEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCleanupLevel_Basis() {
		return (EAttribute)cleanupLevelEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCleanupLevel_SoilLevelEntered() {
		return (EAttribute)cleanupLevelEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCleanupLevel_PorewaterLevelEntered() {
		return (EAttribute)cleanupLevelEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCleanupLevel_PorewaterLevelMilligramsPerLitre() {
		return (EAttribute)cleanupLevelEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCleanupLevel_Statistic() {
		return (EAttribute)cleanupLevelEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getTreatmentZone() {
		return treatmentZoneEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTreatmentZone_Name() {
		return (EAttribute)treatmentZoneEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTreatmentZone_AreaSquareMetres() {
		return (EAttribute)treatmentZoneEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTreatmentZone_TopDepthMetres() {
		return (EAttribute)treatmentZoneEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTreatmentZone_BottomDepthMetres() {
		return (EAttribute)treatmentZoneEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getTreatmentZone_SourceConcentrations() {
		return (EReference)treatmentZoneEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getTreatmentZone_Footprint() {
		return (EReference)treatmentZoneEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTreatmentZone_EffectiveAreaSquareMetres() {
		return (EAttribute)treatmentZoneEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTreatmentZone_VolumeCubicMetres() {
		return (EAttribute)treatmentZoneEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTreatmentZone_PoreVolumeCubicMetres() {
		return (EAttribute)treatmentZoneEClass.getEStructuralFeatures().get(8);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getSourceConcentration() {
		return sourceConcentrationEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getSourceConcentration_Contaminant() {
		return (EReference)sourceConcentrationEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSourceConcentration_SoilConcentrationMilligramsPerKg() {
		return (EAttribute)sourceConcentrationEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getFlushingDesign() {
		return flushingDesignEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getFlushingDesign_Name() {
		return (EAttribute)flushingDesignEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getFlushingDesign_Zone() {
		return (EReference)flushingDesignEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getFlushingDesign_DarcyFluxMetresPerDay() {
		return (EAttribute)flushingDesignEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getFlushingDesign_OperatingDaysPerWeek() {
		return (EAttribute)flushingDesignEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getFlushingDesign_CaptureEfficiency() {
		return (EAttribute)flushingDesignEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getFlushingDesign_Criterion() {
		return (EAttribute)flushingDesignEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getFlushingDesign_MaxPoreVolumes() {
		return (EAttribute)flushingDesignEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getFlushingDesign_SolutionMethod() {
		return (EAttribute)flushingDesignEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getFlushingDesign_NumericalCellCount() {
		return (EAttribute)flushingDesignEClass.getEStructuralFeatures().get(8);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getFlushingDesign_NumericalRelativeTolerance() {
		return (EAttribute)flushingDesignEClass.getEStructuralFeatures().get(9);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getFlushingDesign_MonitoringIntervalDays() {
		return (EAttribute)flushingDesignEClass.getEStructuralFeatures().get(10);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getFlushingDesign_AmendmentName() {
		return (EAttribute)flushingDesignEClass.getEStructuralFeatures().get(11);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getFlushingDesign_AmendmentDoseKilogramsPerCubicMetre() {
		return (EAttribute)flushingDesignEClass.getEStructuralFeatures().get(12);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getFlushingDesign_PriceBook() {
		return (EReference)flushingDesignEClass.getEStructuralFeatures().get(13);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getRevision() {
		return revisionEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRevision_Author() {
		return (EAttribute)revisionEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRevision_Timestamp() {
		return (EAttribute)revisionEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRevision_Summary() {
		return (EAttribute)revisionEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getVertex() {
		return vertexEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getVertex_EastingMetres() {
		return (EAttribute)vertexEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getVertex_NorthingMetres() {
		return (EAttribute)vertexEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getSamplingLocation() {
		return samplingLocationEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSamplingLocation_Name() {
		return (EAttribute)samplingLocationEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSamplingLocation_EastingMetres() {
		return (EAttribute)samplingLocationEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSamplingLocation_NorthingMetres() {
		return (EAttribute)samplingLocationEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSamplingLocation_GroundElevationMetres() {
		return (EAttribute)samplingLocationEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getSamplingLocation_Samples() {
		return (EReference)samplingLocationEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getSample() {
		return sampleEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSample_TopDepthMetres() {
		return (EAttribute)sampleEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSample_BottomDepthMetres() {
		return (EAttribute)sampleEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getSample_Contaminant() {
		return (EReference)sampleEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSample_ConcentrationMilligramsPerKg() {
		return (EAttribute)sampleEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSample_NonDetect() {
		return (EAttribute)sampleEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getSample_DetectionLimitMilligramsPerKg() {
		return (EAttribute)sampleEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getExcavationDesign() {
		return excavationDesignEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getExcavationDesign_Name() {
		return (EAttribute)excavationDesignEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getExcavationDesign_Zone() {
		return (EReference)excavationDesignEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getExcavationDesign_SoilType() {
		return (EAttribute)excavationDesignEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getExcavationDesign_SideSlopeHorizontalPerVertical() {
		return (EAttribute)excavationDesignEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getExcavationDesign_OverdigMetres() {
		return (EAttribute)excavationDesignEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getExcavationDesign_TruckHeapedCapacityCubicMetres() {
		return (EAttribute)excavationDesignEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getExcavationDesign_TruckPayloadKilograms() {
		return (EAttribute)excavationDesignEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getExcavationDesign_PriceBook() {
		return (EReference)excavationDesignEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getPriceBook() {
		return priceBookEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPriceBook_Name() {
		return (EAttribute)priceBookEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPriceBook_Currency() {
		return (EAttribute)priceBookEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPriceBook_Reference() {
		return (EAttribute)priceBookEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getPriceBook_Items() {
		return (EReference)priceBookEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPriceBook_ScopeContingencyPercent() {
		return (EAttribute)priceBookEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPriceBook_BidContingencyPercent() {
		return (EAttribute)priceBookEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPriceBook_ProjectManagementPercent() {
		return (EAttribute)priceBookEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPriceBook_RemedialDesignPercent() {
		return (EAttribute)priceBookEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPriceBook_ConstructionManagementPercent() {
		return (EAttribute)priceBookEClass.getEStructuralFeatures().get(8);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPriceBook_OperatingContingencyPercent() {
		return (EAttribute)priceBookEClass.getEStructuralFeatures().get(9);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPriceBook_OperatingProjectManagementPercent() {
		return (EAttribute)priceBookEClass.getEStructuralFeatures().get(10);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPriceBook_TechnicalSupportPercent() {
		return (EAttribute)priceBookEClass.getEStructuralFeatures().get(11);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPriceBook_DiscountRatePercent() {
		return (EAttribute)priceBookEClass.getEStructuralFeatures().get(12);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPriceBook_DiscountRateBasis() {
		return (EAttribute)priceBookEClass.getEStructuralFeatures().get(13);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getPriceItem() {
		return priceItemEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPriceItem_Code() {
		return (EAttribute)priceItemEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPriceItem_Name() {
		return (EAttribute)priceItemEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPriceItem_Unit() {
		return (EAttribute)priceItemEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPriceItem_RatePerUnit() {
		return (EAttribute)priceItemEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPriceItem_Currency() {
		return (EAttribute)priceItemEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPriceItem_SourceNote() {
		return (EAttribute)priceItemEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getColumnTest() {
		return columnTestEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getColumnTest_Name() {
		return (EAttribute)columnTestEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getColumnTest_Contaminant() {
		return (EReference)columnTestEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getColumnTest_Layer() {
		return (EReference)columnTestEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getColumnTest_Kind() {
		return (EAttribute)columnTestEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getColumnTest_ColumnLengthMetres() {
		return (EAttribute)columnTestEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getColumnTest_DarcyFluxMetresPerDay() {
		return (EAttribute)columnTestEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getColumnTest_WaterContent() {
		return (EAttribute)columnTestEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getColumnTest_BulkDensityKgPerCubicMetre() {
		return (EAttribute)columnTestEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getColumnTest_ReferenceConcentrationMilligramsPerLitre() {
		return (EAttribute)columnTestEClass.getEStructuralFeatures().get(8);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getColumnTest_Points() {
		return (EReference)columnTestEClass.getEStructuralFeatures().get(9);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getColumnTestPoint() {
		return columnTestPointEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getColumnTestPoint_PoreVolumes() {
		return (EAttribute)columnTestPointEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getColumnTestPoint_RelativeConcentration() {
		return (EAttribute)columnTestPointEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getUncertaintySettings() {
		return uncertaintySettingsEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getUncertaintySettings_Enabled() {
		return (EAttribute)uncertaintySettingsEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getUncertaintySettings_RunCount() {
		return (EAttribute)uncertaintySettingsEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getUncertaintySettings_Seed() {
		return (EAttribute)uncertaintySettingsEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getUncertaintySettings_SamplingMethod() {
		return (EAttribute)uncertaintySettingsEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getUncertaintySettings_Inputs() {
		return (EReference)uncertaintySettingsEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getUncertaintySettings_RankCorrelations() {
		return (EReference)uncertaintySettingsEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getUncertainInput() {
		return uncertainInputEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getUncertainInput_Name() {
		return (EAttribute)uncertainInputEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getUncertainInput_Target() {
		return (EReference)uncertainInputEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getUncertainInput_FeatureName() {
		return (EAttribute)uncertainInputEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getUncertainInput_Distribution() {
		return (EAttribute)uncertainInputEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getUncertainInput_MeanInFeatureUnit() {
		return (EAttribute)uncertainInputEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getUncertainInput_StandardDeviationInFeatureUnit() {
		return (EAttribute)uncertainInputEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getUncertainInput_MedianInFeatureUnit() {
		return (EAttribute)uncertainInputEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getUncertainInput_GeometricStandardDeviation() {
		return (EAttribute)uncertainInputEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getUncertainInput_MinimumInFeatureUnit() {
		return (EAttribute)uncertainInputEClass.getEStructuralFeatures().get(8);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getUncertainInput_ModeInFeatureUnit() {
		return (EAttribute)uncertainInputEClass.getEStructuralFeatures().get(9);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getUncertainInput_MaximumInFeatureUnit() {
		return (EAttribute)uncertainInputEClass.getEStructuralFeatures().get(10);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getRankCorrelation() {
		return rankCorrelationEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getRankCorrelation_First() {
		return (EReference)rankCorrelationEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getRankCorrelation_Second() {
		return (EReference)rankCorrelationEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRankCorrelation_Coefficient() {
		return (EAttribute)rankCorrelationEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getZoneAnalysisSettings() {
		return zoneAnalysisSettingsEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getZoneAnalysisSettings_Estimator() {
		return (EAttribute)zoneAnalysisSettingsEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getZoneAnalysisSettings_NonDetectRule() {
		return (EAttribute)zoneAnalysisSettingsEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getZoneAnalysisSettings_InverseDistancePower() {
		return (EAttribute)zoneAnalysisSettingsEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getZoneAnalysisSettings_MaximumNeighbours() {
		return (EAttribute)zoneAnalysisSettingsEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getZoneAnalysisSettings_SearchRadiusMetres() {
		return (EAttribute)zoneAnalysisSettingsEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getZoneAnalysisSettings_VerticalDistanceFactor() {
		return (EAttribute)zoneAnalysisSettingsEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getZoneAnalysisSettings_BlockPlanSizeMetres() {
		return (EAttribute)zoneAnalysisSettingsEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getZoneAnalysisSettings_BlockDepthMetres() {
		return (EAttribute)zoneAnalysisSettingsEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getZoneAnalysisSettings_VariogramModel() {
		return (EAttribute)zoneAnalysisSettingsEClass.getEStructuralFeatures().get(8);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getZoneAnalysisSettings_VariogramNuggetMgPerKgSquared() {
		return (EAttribute)zoneAnalysisSettingsEClass.getEStructuralFeatures().get(9);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getZoneAnalysisSettings_VariogramSillMgPerKgSquared() {
		return (EAttribute)zoneAnalysisSettingsEClass.getEStructuralFeatures().get(10);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getZoneAnalysisSettings_VariogramRangeMetres() {
		return (EAttribute)zoneAnalysisSettingsEClass.getEStructuralFeatures().get(11);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getZoneAnalysisSettings_DelayYears() {
		return (EAttribute)zoneAnalysisSettingsEClass.getEStructuralFeatures().get(12);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getZoneAnalysisSettings_TransverseDispersivityFraction() {
		return (EAttribute)zoneAnalysisSettingsEClass.getEStructuralFeatures().get(13);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getZoneAnalysisSettings_HotSpotMultiple() {
		return (EAttribute)zoneAnalysisSettingsEClass.getEStructuralFeatures().get(14);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getComplianceCriterion() {
		return complianceCriterionEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getUnitSystem() {
		return unitSystemEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getDispersivityRule() {
		return dispersivityRuleEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getSorptionIsotherm() {
		return sorptionIsothermEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getNonequilibriumEntry() {
		return nonequilibriumEntryEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getComplianceStatistic() {
		return complianceStatisticEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getSolutionMethod() {
		return solutionMethodEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getExcavationSoilType() {
		return excavationSoilTypeEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getColumnTestKind() {
		return columnTestKindEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getUncertaintySampling() {
		return uncertaintySamplingEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getInputDistributionKind() {
		return inputDistributionKindEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getZoneEstimatorKind() {
		return zoneEstimatorKindEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getNonDetectValue() {
		return nonDetectValueEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getVariogramShapeKind() {
		return variogramShapeKindEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public SiteFactory getSiteFactory() {
		return (SiteFactory)getEFactoryInstance();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private boolean isCreated = false;

	/**
	 * Creates the meta-model objects for the package.  This method is
	 * guarded to have no affect on any invocation but its first.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public void createPackageContents() {
		if (isCreated) return;
		isCreated = true;

		// Create classes and their features
		projectEClass = createEClass(PROJECT);
		createEAttribute(projectEClass, PROJECT__NAME);
		createEAttribute(projectEClass, PROJECT__DESCRIPTION);
		createEAttribute(projectEClass, PROJECT__SCHEMA_VERSION);
		createEReference(projectEClass, PROJECT__SITE);
		createEReference(projectEClass, PROJECT__CONTAMINANTS);
		createEReference(projectEClass, PROJECT__CLEANUP_LEVELS);
		createEReference(projectEClass, PROJECT__FLUSHING_DESIGNS);
		createEAttribute(projectEClass, PROJECT__UNIT_SYSTEM);
		createEReference(projectEClass, PROJECT__REVISIONS);
		createEReference(projectEClass, PROJECT__EXCAVATION_DESIGNS);
		createEReference(projectEClass, PROJECT__PRICE_BOOKS);
		createEReference(projectEClass, PROJECT__COLUMN_TESTS);
		createEReference(projectEClass, PROJECT__UNCERTAINTY);
		createEReference(projectEClass, PROJECT__ZONE_ANALYSIS);

		siteEClass = createEClass(SITE);
		createEAttribute(siteEClass, SITE__NAME);
		createEAttribute(siteEClass, SITE__DESCRIPTION);
		createEReference(siteEClass, SITE__LAYERS);
		createEReference(siteEClass, SITE__ZONES);
		createEAttribute(siteEClass, SITE__COORDINATE_FRAME);
		createEAttribute(siteEClass, SITE__GROUND_SURFACE_ELEVATION_METRES);
		createEReference(siteEClass, SITE__BOUNDARY);
		createEReference(siteEClass, SITE__SAMPLING_LOCATIONS);

		soilLayerEClass = createEClass(SOIL_LAYER);
		createEAttribute(soilLayerEClass, SOIL_LAYER__NAME);
		createEAttribute(soilLayerEClass, SOIL_LAYER__TOP_DEPTH_METRES);
		createEAttribute(soilLayerEClass, SOIL_LAYER__BOTTOM_DEPTH_METRES);
		createEAttribute(soilLayerEClass, SOIL_LAYER__TEXTURE_CLASS);
		createEAttribute(soilLayerEClass, SOIL_LAYER__BULK_DENSITY_KG_PER_CUBIC_METRE);
		createEAttribute(soilLayerEClass, SOIL_LAYER__POROSITY);
		createEAttribute(soilLayerEClass, SOIL_LAYER__WATER_CONTENT);
		createEAttribute(soilLayerEClass, SOIL_LAYER__ORGANIC_CARBON_FRACTION);
		createEAttribute(soilLayerEClass, SOIL_LAYER__SATURATED_CONDUCTIVITY_METRES_PER_DAY);
		createEAttribute(soilLayerEClass, SOIL_LAYER__DISPERSIVITY_METRES);
		createEAttribute(soilLayerEClass, SOIL_LAYER__SWELL_FACTOR);
		createEAttribute(soilLayerEClass, SOIL_LAYER__SHRINKAGE_FACTOR);
		createEAttribute(soilLayerEClass, SOIL_LAYER__DISPERSIVITY_RULE);
		createEAttribute(soilLayerEClass, SOIL_LAYER__DISPERSIVITY_SCALE_METRES);
		createEAttribute(soilLayerEClass, SOIL_LAYER__EFFECTIVE_DISPERSIVITY_METRES);

		contaminantEClass = createEClass(CONTAMINANT);
		createEAttribute(contaminantEClass, CONTAMINANT__NAME);
		createEAttribute(contaminantEClass, CONTAMINANT__CAS_NUMBER);
		createEAttribute(contaminantEClass, CONTAMINANT__KOC_LITRES_PER_KG);
		createEAttribute(contaminantEClass, CONTAMINANT__KD_ENTERED);
		createEAttribute(contaminantEClass, CONTAMINANT__KD_LITRES_PER_KG);
		createEAttribute(contaminantEClass, CONTAMINANT__DIFFUSION_SQUARE_METRES_PER_SECOND);
		createEAttribute(contaminantEClass, CONTAMINANT__HALF_LIFE_DAYS);
		createEAttribute(contaminantEClass, CONTAMINANT__ISOTHERM);
		createEAttribute(contaminantEClass, CONTAMINANT__FREUNDLICH_KF_MG_PER_KG_PER_MG_PER_LITRE_TO_N);
		createEAttribute(contaminantEClass, CONTAMINANT__FREUNDLICH_EXPONENT);
		createEAttribute(contaminantEClass, CONTAMINANT__LANGMUIR_MAXIMUM_MILLIGRAMS_PER_KG);
		createEAttribute(contaminantEClass, CONTAMINANT__LANGMUIR_CONSTANT_LITRES_PER_MILLIGRAM);
		createEAttribute(contaminantEClass, CONTAMINANT__WATER_SOLUBILITY_MILLIGRAMS_PER_LITRE);
		createEAttribute(contaminantEClass, CONTAMINANT__NONEQUILIBRIUM);
		createEAttribute(contaminantEClass, CONTAMINANT__BETA);
		createEAttribute(contaminantEClass, CONTAMINANT__OMEGA);
		createEAttribute(contaminantEClass, CONTAMINANT__MOBILE_WATER_FRACTION);
		createEAttribute(contaminantEClass, CONTAMINANT__MOBILE_SITE_FRACTION);
		createEAttribute(contaminantEClass, CONTAMINANT__MASS_TRANSFER_RATE_PER_DAY);
		createEAttribute(contaminantEClass, CONTAMINANT__PROPERTY_SOURCE);

		cleanupLevelEClass = createEClass(CLEANUP_LEVEL);
		createEReference(cleanupLevelEClass, CLEANUP_LEVEL__CONTAMINANT);
		createEAttribute(cleanupLevelEClass, CLEANUP_LEVEL__SOIL_LEVEL_MILLIGRAMS_PER_KG);
		createEAttribute(cleanupLevelEClass, CLEANUP_LEVEL__BASIS);
		createEAttribute(cleanupLevelEClass, CLEANUP_LEVEL__SOIL_LEVEL_ENTERED);
		createEAttribute(cleanupLevelEClass, CLEANUP_LEVEL__POREWATER_LEVEL_ENTERED);
		createEAttribute(cleanupLevelEClass, CLEANUP_LEVEL__POREWATER_LEVEL_MILLIGRAMS_PER_LITRE);
		createEAttribute(cleanupLevelEClass, CLEANUP_LEVEL__STATISTIC);

		treatmentZoneEClass = createEClass(TREATMENT_ZONE);
		createEAttribute(treatmentZoneEClass, TREATMENT_ZONE__NAME);
		createEAttribute(treatmentZoneEClass, TREATMENT_ZONE__AREA_SQUARE_METRES);
		createEAttribute(treatmentZoneEClass, TREATMENT_ZONE__TOP_DEPTH_METRES);
		createEAttribute(treatmentZoneEClass, TREATMENT_ZONE__BOTTOM_DEPTH_METRES);
		createEReference(treatmentZoneEClass, TREATMENT_ZONE__SOURCE_CONCENTRATIONS);
		createEReference(treatmentZoneEClass, TREATMENT_ZONE__FOOTPRINT);
		createEAttribute(treatmentZoneEClass, TREATMENT_ZONE__EFFECTIVE_AREA_SQUARE_METRES);
		createEAttribute(treatmentZoneEClass, TREATMENT_ZONE__VOLUME_CUBIC_METRES);
		createEAttribute(treatmentZoneEClass, TREATMENT_ZONE__PORE_VOLUME_CUBIC_METRES);

		sourceConcentrationEClass = createEClass(SOURCE_CONCENTRATION);
		createEReference(sourceConcentrationEClass, SOURCE_CONCENTRATION__CONTAMINANT);
		createEAttribute(sourceConcentrationEClass, SOURCE_CONCENTRATION__SOIL_CONCENTRATION_MILLIGRAMS_PER_KG);

		flushingDesignEClass = createEClass(FLUSHING_DESIGN);
		createEAttribute(flushingDesignEClass, FLUSHING_DESIGN__NAME);
		createEReference(flushingDesignEClass, FLUSHING_DESIGN__ZONE);
		createEAttribute(flushingDesignEClass, FLUSHING_DESIGN__DARCY_FLUX_METRES_PER_DAY);
		createEAttribute(flushingDesignEClass, FLUSHING_DESIGN__OPERATING_DAYS_PER_WEEK);
		createEAttribute(flushingDesignEClass, FLUSHING_DESIGN__CAPTURE_EFFICIENCY);
		createEAttribute(flushingDesignEClass, FLUSHING_DESIGN__CRITERION);
		createEAttribute(flushingDesignEClass, FLUSHING_DESIGN__MAX_PORE_VOLUMES);
		createEAttribute(flushingDesignEClass, FLUSHING_DESIGN__SOLUTION_METHOD);
		createEAttribute(flushingDesignEClass, FLUSHING_DESIGN__NUMERICAL_CELL_COUNT);
		createEAttribute(flushingDesignEClass, FLUSHING_DESIGN__NUMERICAL_RELATIVE_TOLERANCE);
		createEAttribute(flushingDesignEClass, FLUSHING_DESIGN__MONITORING_INTERVAL_DAYS);
		createEAttribute(flushingDesignEClass, FLUSHING_DESIGN__AMENDMENT_NAME);
		createEAttribute(flushingDesignEClass, FLUSHING_DESIGN__AMENDMENT_DOSE_KILOGRAMS_PER_CUBIC_METRE);
		createEReference(flushingDesignEClass, FLUSHING_DESIGN__PRICE_BOOK);

		revisionEClass = createEClass(REVISION);
		createEAttribute(revisionEClass, REVISION__AUTHOR);
		createEAttribute(revisionEClass, REVISION__TIMESTAMP);
		createEAttribute(revisionEClass, REVISION__SUMMARY);

		vertexEClass = createEClass(VERTEX);
		createEAttribute(vertexEClass, VERTEX__EASTING_METRES);
		createEAttribute(vertexEClass, VERTEX__NORTHING_METRES);

		samplingLocationEClass = createEClass(SAMPLING_LOCATION);
		createEAttribute(samplingLocationEClass, SAMPLING_LOCATION__NAME);
		createEAttribute(samplingLocationEClass, SAMPLING_LOCATION__EASTING_METRES);
		createEAttribute(samplingLocationEClass, SAMPLING_LOCATION__NORTHING_METRES);
		createEAttribute(samplingLocationEClass, SAMPLING_LOCATION__GROUND_ELEVATION_METRES);
		createEReference(samplingLocationEClass, SAMPLING_LOCATION__SAMPLES);

		sampleEClass = createEClass(SAMPLE);
		createEAttribute(sampleEClass, SAMPLE__TOP_DEPTH_METRES);
		createEAttribute(sampleEClass, SAMPLE__BOTTOM_DEPTH_METRES);
		createEReference(sampleEClass, SAMPLE__CONTAMINANT);
		createEAttribute(sampleEClass, SAMPLE__CONCENTRATION_MILLIGRAMS_PER_KG);
		createEAttribute(sampleEClass, SAMPLE__NON_DETECT);
		createEAttribute(sampleEClass, SAMPLE__DETECTION_LIMIT_MILLIGRAMS_PER_KG);

		excavationDesignEClass = createEClass(EXCAVATION_DESIGN);
		createEAttribute(excavationDesignEClass, EXCAVATION_DESIGN__NAME);
		createEReference(excavationDesignEClass, EXCAVATION_DESIGN__ZONE);
		createEAttribute(excavationDesignEClass, EXCAVATION_DESIGN__SOIL_TYPE);
		createEAttribute(excavationDesignEClass, EXCAVATION_DESIGN__SIDE_SLOPE_HORIZONTAL_PER_VERTICAL);
		createEAttribute(excavationDesignEClass, EXCAVATION_DESIGN__OVERDIG_METRES);
		createEAttribute(excavationDesignEClass, EXCAVATION_DESIGN__TRUCK_HEAPED_CAPACITY_CUBIC_METRES);
		createEAttribute(excavationDesignEClass, EXCAVATION_DESIGN__TRUCK_PAYLOAD_KILOGRAMS);
		createEReference(excavationDesignEClass, EXCAVATION_DESIGN__PRICE_BOOK);

		priceBookEClass = createEClass(PRICE_BOOK);
		createEAttribute(priceBookEClass, PRICE_BOOK__NAME);
		createEAttribute(priceBookEClass, PRICE_BOOK__CURRENCY);
		createEAttribute(priceBookEClass, PRICE_BOOK__REFERENCE);
		createEReference(priceBookEClass, PRICE_BOOK__ITEMS);
		createEAttribute(priceBookEClass, PRICE_BOOK__SCOPE_CONTINGENCY_PERCENT);
		createEAttribute(priceBookEClass, PRICE_BOOK__BID_CONTINGENCY_PERCENT);
		createEAttribute(priceBookEClass, PRICE_BOOK__PROJECT_MANAGEMENT_PERCENT);
		createEAttribute(priceBookEClass, PRICE_BOOK__REMEDIAL_DESIGN_PERCENT);
		createEAttribute(priceBookEClass, PRICE_BOOK__CONSTRUCTION_MANAGEMENT_PERCENT);
		createEAttribute(priceBookEClass, PRICE_BOOK__OPERATING_CONTINGENCY_PERCENT);
		createEAttribute(priceBookEClass, PRICE_BOOK__OPERATING_PROJECT_MANAGEMENT_PERCENT);
		createEAttribute(priceBookEClass, PRICE_BOOK__TECHNICAL_SUPPORT_PERCENT);
		createEAttribute(priceBookEClass, PRICE_BOOK__DISCOUNT_RATE_PERCENT);
		createEAttribute(priceBookEClass, PRICE_BOOK__DISCOUNT_RATE_BASIS);

		priceItemEClass = createEClass(PRICE_ITEM);
		createEAttribute(priceItemEClass, PRICE_ITEM__CODE);
		createEAttribute(priceItemEClass, PRICE_ITEM__NAME);
		createEAttribute(priceItemEClass, PRICE_ITEM__UNIT);
		createEAttribute(priceItemEClass, PRICE_ITEM__RATE_PER_UNIT);
		createEAttribute(priceItemEClass, PRICE_ITEM__CURRENCY);
		createEAttribute(priceItemEClass, PRICE_ITEM__SOURCE_NOTE);

		columnTestEClass = createEClass(COLUMN_TEST);
		createEAttribute(columnTestEClass, COLUMN_TEST__NAME);
		createEReference(columnTestEClass, COLUMN_TEST__CONTAMINANT);
		createEReference(columnTestEClass, COLUMN_TEST__LAYER);
		createEAttribute(columnTestEClass, COLUMN_TEST__KIND);
		createEAttribute(columnTestEClass, COLUMN_TEST__COLUMN_LENGTH_METRES);
		createEAttribute(columnTestEClass, COLUMN_TEST__DARCY_FLUX_METRES_PER_DAY);
		createEAttribute(columnTestEClass, COLUMN_TEST__WATER_CONTENT);
		createEAttribute(columnTestEClass, COLUMN_TEST__BULK_DENSITY_KG_PER_CUBIC_METRE);
		createEAttribute(columnTestEClass, COLUMN_TEST__REFERENCE_CONCENTRATION_MILLIGRAMS_PER_LITRE);
		createEReference(columnTestEClass, COLUMN_TEST__POINTS);

		columnTestPointEClass = createEClass(COLUMN_TEST_POINT);
		createEAttribute(columnTestPointEClass, COLUMN_TEST_POINT__PORE_VOLUMES);
		createEAttribute(columnTestPointEClass, COLUMN_TEST_POINT__RELATIVE_CONCENTRATION);

		uncertaintySettingsEClass = createEClass(UNCERTAINTY_SETTINGS);
		createEAttribute(uncertaintySettingsEClass, UNCERTAINTY_SETTINGS__ENABLED);
		createEAttribute(uncertaintySettingsEClass, UNCERTAINTY_SETTINGS__RUN_COUNT);
		createEAttribute(uncertaintySettingsEClass, UNCERTAINTY_SETTINGS__SEED);
		createEAttribute(uncertaintySettingsEClass, UNCERTAINTY_SETTINGS__SAMPLING_METHOD);
		createEReference(uncertaintySettingsEClass, UNCERTAINTY_SETTINGS__INPUTS);
		createEReference(uncertaintySettingsEClass, UNCERTAINTY_SETTINGS__RANK_CORRELATIONS);

		uncertainInputEClass = createEClass(UNCERTAIN_INPUT);
		createEAttribute(uncertainInputEClass, UNCERTAIN_INPUT__NAME);
		createEReference(uncertainInputEClass, UNCERTAIN_INPUT__TARGET);
		createEAttribute(uncertainInputEClass, UNCERTAIN_INPUT__FEATURE_NAME);
		createEAttribute(uncertainInputEClass, UNCERTAIN_INPUT__DISTRIBUTION);
		createEAttribute(uncertainInputEClass, UNCERTAIN_INPUT__MEAN_IN_FEATURE_UNIT);
		createEAttribute(uncertainInputEClass, UNCERTAIN_INPUT__STANDARD_DEVIATION_IN_FEATURE_UNIT);
		createEAttribute(uncertainInputEClass, UNCERTAIN_INPUT__MEDIAN_IN_FEATURE_UNIT);
		createEAttribute(uncertainInputEClass, UNCERTAIN_INPUT__GEOMETRIC_STANDARD_DEVIATION);
		createEAttribute(uncertainInputEClass, UNCERTAIN_INPUT__MINIMUM_IN_FEATURE_UNIT);
		createEAttribute(uncertainInputEClass, UNCERTAIN_INPUT__MODE_IN_FEATURE_UNIT);
		createEAttribute(uncertainInputEClass, UNCERTAIN_INPUT__MAXIMUM_IN_FEATURE_UNIT);

		rankCorrelationEClass = createEClass(RANK_CORRELATION);
		createEReference(rankCorrelationEClass, RANK_CORRELATION__FIRST);
		createEReference(rankCorrelationEClass, RANK_CORRELATION__SECOND);
		createEAttribute(rankCorrelationEClass, RANK_CORRELATION__COEFFICIENT);

		zoneAnalysisSettingsEClass = createEClass(ZONE_ANALYSIS_SETTINGS);
		createEAttribute(zoneAnalysisSettingsEClass, ZONE_ANALYSIS_SETTINGS__ESTIMATOR);
		createEAttribute(zoneAnalysisSettingsEClass, ZONE_ANALYSIS_SETTINGS__NON_DETECT_RULE);
		createEAttribute(zoneAnalysisSettingsEClass, ZONE_ANALYSIS_SETTINGS__INVERSE_DISTANCE_POWER);
		createEAttribute(zoneAnalysisSettingsEClass, ZONE_ANALYSIS_SETTINGS__MAXIMUM_NEIGHBOURS);
		createEAttribute(zoneAnalysisSettingsEClass, ZONE_ANALYSIS_SETTINGS__SEARCH_RADIUS_METRES);
		createEAttribute(zoneAnalysisSettingsEClass, ZONE_ANALYSIS_SETTINGS__VERTICAL_DISTANCE_FACTOR);
		createEAttribute(zoneAnalysisSettingsEClass, ZONE_ANALYSIS_SETTINGS__BLOCK_PLAN_SIZE_METRES);
		createEAttribute(zoneAnalysisSettingsEClass, ZONE_ANALYSIS_SETTINGS__BLOCK_DEPTH_METRES);
		createEAttribute(zoneAnalysisSettingsEClass, ZONE_ANALYSIS_SETTINGS__VARIOGRAM_MODEL);
		createEAttribute(zoneAnalysisSettingsEClass, ZONE_ANALYSIS_SETTINGS__VARIOGRAM_NUGGET_MG_PER_KG_SQUARED);
		createEAttribute(zoneAnalysisSettingsEClass, ZONE_ANALYSIS_SETTINGS__VARIOGRAM_SILL_MG_PER_KG_SQUARED);
		createEAttribute(zoneAnalysisSettingsEClass, ZONE_ANALYSIS_SETTINGS__VARIOGRAM_RANGE_METRES);
		createEAttribute(zoneAnalysisSettingsEClass, ZONE_ANALYSIS_SETTINGS__DELAY_YEARS);
		createEAttribute(zoneAnalysisSettingsEClass, ZONE_ANALYSIS_SETTINGS__TRANSVERSE_DISPERSIVITY_FRACTION);
		createEAttribute(zoneAnalysisSettingsEClass, ZONE_ANALYSIS_SETTINGS__HOT_SPOT_MULTIPLE);

		// Create enums
		complianceCriterionEEnum = createEEnum(COMPLIANCE_CRITERION);
		unitSystemEEnum = createEEnum(UNIT_SYSTEM);
		dispersivityRuleEEnum = createEEnum(DISPERSIVITY_RULE);
		sorptionIsothermEEnum = createEEnum(SORPTION_ISOTHERM);
		nonequilibriumEntryEEnum = createEEnum(NONEQUILIBRIUM_ENTRY);
		complianceStatisticEEnum = createEEnum(COMPLIANCE_STATISTIC);
		solutionMethodEEnum = createEEnum(SOLUTION_METHOD);
		excavationSoilTypeEEnum = createEEnum(EXCAVATION_SOIL_TYPE);
		columnTestKindEEnum = createEEnum(COLUMN_TEST_KIND);
		uncertaintySamplingEEnum = createEEnum(UNCERTAINTY_SAMPLING);
		inputDistributionKindEEnum = createEEnum(INPUT_DISTRIBUTION_KIND);
		zoneEstimatorKindEEnum = createEEnum(ZONE_ESTIMATOR_KIND);
		nonDetectValueEEnum = createEEnum(NON_DETECT_VALUE);
		variogramShapeKindEEnum = createEEnum(VARIOGRAM_SHAPE_KIND);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private boolean isInitialized = false;

	/**
	 * Complete the initialization of the package and its meta-model.  This
	 * method is guarded to have no affect on any invocation but its first.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public void initializePackageContents() {
		if (isInitialized) return;
		isInitialized = true;

		// Initialize package
		setName(eNAME);
		setNsPrefix(eNS_PREFIX);
		setNsURI(eNS_URI);

		// Create type parameters

		// Set bounds for type parameters

		// Add supertypes to classes

		// Initialize classes, features, and operations; add parameters
		initEClass(projectEClass, Project.class, "Project", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getProject_Name(), ecorePackage.getEString(), "name", null, 0, 1, Project.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getProject_Description(), ecorePackage.getEString(), "description", null, 0, 1, Project.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getProject_SchemaVersion(), ecorePackage.getEInt(), "schemaVersion", null, 0, 1, Project.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getProject_Site(), this.getSite(), null, "site", null, 1, 1, Project.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getProject_Contaminants(), this.getContaminant(), null, "contaminants", null, 0, -1, Project.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getProject_CleanupLevels(), this.getCleanupLevel(), null, "cleanupLevels", null, 0, -1, Project.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getProject_FlushingDesigns(), this.getFlushingDesign(), null, "flushingDesigns", null, 0, -1, Project.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getProject_UnitSystem(), this.getUnitSystem(), "unitSystem", null, 0, 1, Project.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getProject_Revisions(), this.getRevision(), null, "revisions", null, 0, -1, Project.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getProject_ExcavationDesigns(), this.getExcavationDesign(), null, "excavationDesigns", null, 0, -1, Project.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getProject_PriceBooks(), this.getPriceBook(), null, "priceBooks", null, 0, -1, Project.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getProject_ColumnTests(), this.getColumnTest(), null, "columnTests", null, 0, -1, Project.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getProject_Uncertainty(), this.getUncertaintySettings(), null, "uncertainty", null, 0, 1, Project.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getProject_ZoneAnalysis(), this.getZoneAnalysisSettings(), null, "zoneAnalysis", null, 0, 1, Project.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(siteEClass, Site.class, "Site", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getSite_Name(), ecorePackage.getEString(), "name", null, 0, 1, Site.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSite_Description(), ecorePackage.getEString(), "description", null, 0, 1, Site.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getSite_Layers(), this.getSoilLayer(), null, "layers", null, 0, -1, Site.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getSite_Zones(), this.getTreatmentZone(), null, "zones", null, 0, -1, Site.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSite_CoordinateFrame(), ecorePackage.getEString(), "coordinateFrame", null, 0, 1, Site.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSite_GroundSurfaceElevationMetres(), ecorePackage.getEDouble(), "groundSurfaceElevationMetres", null, 0, 1, Site.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getSite_Boundary(), this.getVertex(), null, "boundary", null, 0, -1, Site.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getSite_SamplingLocations(), this.getSamplingLocation(), null, "samplingLocations", null, 0, -1, Site.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(soilLayerEClass, SoilLayer.class, "SoilLayer", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getSoilLayer_Name(), ecorePackage.getEString(), "name", null, 0, 1, SoilLayer.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSoilLayer_TopDepthMetres(), ecorePackage.getEDouble(), "topDepthMetres", null, 0, 1, SoilLayer.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSoilLayer_BottomDepthMetres(), ecorePackage.getEDouble(), "bottomDepthMetres", null, 0, 1, SoilLayer.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSoilLayer_TextureClass(), ecorePackage.getEString(), "textureClass", null, 0, 1, SoilLayer.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSoilLayer_BulkDensityKgPerCubicMetre(), ecorePackage.getEDouble(), "bulkDensityKgPerCubicMetre", null, 0, 1, SoilLayer.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSoilLayer_Porosity(), ecorePackage.getEDouble(), "porosity", null, 0, 1, SoilLayer.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSoilLayer_WaterContent(), ecorePackage.getEDouble(), "waterContent", null, 0, 1, SoilLayer.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSoilLayer_OrganicCarbonFraction(), ecorePackage.getEDouble(), "organicCarbonFraction", null, 0, 1, SoilLayer.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSoilLayer_SaturatedConductivityMetresPerDay(), ecorePackage.getEDouble(), "saturatedConductivityMetresPerDay", null, 0, 1, SoilLayer.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSoilLayer_DispersivityMetres(), ecorePackage.getEDouble(), "dispersivityMetres", null, 0, 1, SoilLayer.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSoilLayer_SwellFactor(), ecorePackage.getEDouble(), "swellFactor", null, 0, 1, SoilLayer.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSoilLayer_ShrinkageFactor(), ecorePackage.getEDouble(), "shrinkageFactor", null, 0, 1, SoilLayer.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSoilLayer_DispersivityRule(), this.getDispersivityRule(), "dispersivityRule", null, 0, 1, SoilLayer.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSoilLayer_DispersivityScaleMetres(), ecorePackage.getEDouble(), "dispersivityScaleMetres", null, 0, 1, SoilLayer.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSoilLayer_EffectiveDispersivityMetres(), ecorePackage.getEDouble(), "effectiveDispersivityMetres", null, 0, 1, SoilLayer.class, IS_TRANSIENT, IS_VOLATILE, !IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, IS_DERIVED, IS_ORDERED);

		initEClass(contaminantEClass, Contaminant.class, "Contaminant", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getContaminant_Name(), ecorePackage.getEString(), "name", null, 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_CasNumber(), ecorePackage.getEString(), "casNumber", null, 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_KocLitresPerKg(), ecorePackage.getEDouble(), "kocLitresPerKg", null, 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_KdEntered(), ecorePackage.getEBoolean(), "kdEntered", null, 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_KdLitresPerKg(), ecorePackage.getEDouble(), "kdLitresPerKg", null, 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_DiffusionSquareMetresPerSecond(), ecorePackage.getEDouble(), "diffusionSquareMetresPerSecond", "1.0E-9", 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_HalfLifeDays(), ecorePackage.getEDouble(), "halfLifeDays", null, 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_Isotherm(), this.getSorptionIsotherm(), "isotherm", null, 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_FreundlichKfMgPerKgPerMgPerLitreToN(), ecorePackage.getEDouble(), "freundlichKfMgPerKgPerMgPerLitreToN", null, 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_FreundlichExponent(), ecorePackage.getEDouble(), "freundlichExponent", "1", 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_LangmuirMaximumMilligramsPerKg(), ecorePackage.getEDouble(), "langmuirMaximumMilligramsPerKg", null, 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_LangmuirConstantLitresPerMilligram(), ecorePackage.getEDouble(), "langmuirConstantLitresPerMilligram", null, 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_WaterSolubilityMilligramsPerLitre(), ecorePackage.getEDouble(), "waterSolubilityMilligramsPerLitre", null, 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_Nonequilibrium(), this.getNonequilibriumEntry(), "nonequilibrium", null, 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_Beta(), ecorePackage.getEDouble(), "beta", "1", 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_Omega(), ecorePackage.getEDouble(), "omega", null, 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_MobileWaterFraction(), ecorePackage.getEDouble(), "mobileWaterFraction", "1", 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_MobileSiteFraction(), ecorePackage.getEDouble(), "mobileSiteFraction", "1", 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_MassTransferRatePerDay(), ecorePackage.getEDouble(), "massTransferRatePerDay", null, 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_PropertySource(), ecorePackage.getEString(), "propertySource", null, 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(cleanupLevelEClass, CleanupLevel.class, "CleanupLevel", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEReference(getCleanupLevel_Contaminant(), this.getContaminant(), null, "contaminant", null, 1, 1, CleanupLevel.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_COMPOSITE, IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getCleanupLevel_SoilLevelMilligramsPerKg(), ecorePackage.getEDouble(), "soilLevelMilligramsPerKg", null, 0, 1, CleanupLevel.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getCleanupLevel_Basis(), ecorePackage.getEString(), "basis", null, 0, 1, CleanupLevel.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getCleanupLevel_SoilLevelEntered(), ecorePackage.getEBoolean(), "soilLevelEntered", "true", 0, 1, CleanupLevel.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getCleanupLevel_PorewaterLevelEntered(), ecorePackage.getEBoolean(), "porewaterLevelEntered", null, 0, 1, CleanupLevel.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getCleanupLevel_PorewaterLevelMilligramsPerLitre(), ecorePackage.getEDouble(), "porewaterLevelMilligramsPerLitre", null, 0, 1, CleanupLevel.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getCleanupLevel_Statistic(), this.getComplianceStatistic(), "statistic", null, 0, 1, CleanupLevel.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(treatmentZoneEClass, TreatmentZone.class, "TreatmentZone", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getTreatmentZone_Name(), ecorePackage.getEString(), "name", null, 0, 1, TreatmentZone.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getTreatmentZone_AreaSquareMetres(), ecorePackage.getEDouble(), "areaSquareMetres", null, 0, 1, TreatmentZone.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getTreatmentZone_TopDepthMetres(), ecorePackage.getEDouble(), "topDepthMetres", null, 0, 1, TreatmentZone.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getTreatmentZone_BottomDepthMetres(), ecorePackage.getEDouble(), "bottomDepthMetres", null, 0, 1, TreatmentZone.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getTreatmentZone_SourceConcentrations(), this.getSourceConcentration(), null, "sourceConcentrations", null, 0, -1, TreatmentZone.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getTreatmentZone_Footprint(), this.getVertex(), null, "footprint", null, 0, -1, TreatmentZone.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getTreatmentZone_EffectiveAreaSquareMetres(), ecorePackage.getEDouble(), "effectiveAreaSquareMetres", null, 0, 1, TreatmentZone.class, IS_TRANSIENT, IS_VOLATILE, !IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, IS_DERIVED, IS_ORDERED);
		initEAttribute(getTreatmentZone_VolumeCubicMetres(), ecorePackage.getEDouble(), "volumeCubicMetres", null, 0, 1, TreatmentZone.class, IS_TRANSIENT, IS_VOLATILE, !IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, IS_DERIVED, IS_ORDERED);
		initEAttribute(getTreatmentZone_PoreVolumeCubicMetres(), ecorePackage.getEDouble(), "poreVolumeCubicMetres", null, 0, 1, TreatmentZone.class, IS_TRANSIENT, IS_VOLATILE, !IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, IS_DERIVED, IS_ORDERED);

		initEClass(sourceConcentrationEClass, SourceConcentration.class, "SourceConcentration", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEReference(getSourceConcentration_Contaminant(), this.getContaminant(), null, "contaminant", null, 1, 1, SourceConcentration.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_COMPOSITE, IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSourceConcentration_SoilConcentrationMilligramsPerKg(), ecorePackage.getEDouble(), "soilConcentrationMilligramsPerKg", null, 0, 1, SourceConcentration.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(flushingDesignEClass, FlushingDesign.class, "FlushingDesign", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getFlushingDesign_Name(), ecorePackage.getEString(), "name", null, 0, 1, FlushingDesign.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getFlushingDesign_Zone(), this.getTreatmentZone(), null, "zone", null, 1, 1, FlushingDesign.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_COMPOSITE, IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getFlushingDesign_DarcyFluxMetresPerDay(), ecorePackage.getEDouble(), "darcyFluxMetresPerDay", null, 0, 1, FlushingDesign.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getFlushingDesign_OperatingDaysPerWeek(), ecorePackage.getEDouble(), "operatingDaysPerWeek", "7", 0, 1, FlushingDesign.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getFlushingDesign_CaptureEfficiency(), ecorePackage.getEDouble(), "captureEfficiency", "0.95", 0, 1, FlushingDesign.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getFlushingDesign_Criterion(), this.getComplianceCriterion(), "criterion", null, 0, 1, FlushingDesign.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getFlushingDesign_MaxPoreVolumes(), ecorePackage.getEDouble(), "maxPoreVolumes", "1000", 0, 1, FlushingDesign.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getFlushingDesign_SolutionMethod(), this.getSolutionMethod(), "solutionMethod", null, 0, 1, FlushingDesign.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getFlushingDesign_NumericalCellCount(), ecorePackage.getEInt(), "numericalCellCount", "200", 0, 1, FlushingDesign.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getFlushingDesign_NumericalRelativeTolerance(), ecorePackage.getEDouble(), "numericalRelativeTolerance", "1.0E-6", 0, 1, FlushingDesign.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getFlushingDesign_MonitoringIntervalDays(), ecorePackage.getEDouble(), "monitoringIntervalDays", "7", 0, 1, FlushingDesign.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getFlushingDesign_AmendmentName(), ecorePackage.getEString(), "amendmentName", null, 0, 1, FlushingDesign.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getFlushingDesign_AmendmentDoseKilogramsPerCubicMetre(), ecorePackage.getEDouble(), "amendmentDoseKilogramsPerCubicMetre", null, 0, 1, FlushingDesign.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getFlushingDesign_PriceBook(), this.getPriceBook(), null, "priceBook", null, 0, 1, FlushingDesign.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_COMPOSITE, IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(revisionEClass, Revision.class, "Revision", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getRevision_Author(), ecorePackage.getEString(), "author", null, 0, 1, Revision.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getRevision_Timestamp(), ecorePackage.getEDate(), "timestamp", null, 0, 1, Revision.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getRevision_Summary(), ecorePackage.getEString(), "summary", null, 0, 1, Revision.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(vertexEClass, Vertex.class, "Vertex", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getVertex_EastingMetres(), ecorePackage.getEDouble(), "eastingMetres", null, 0, 1, Vertex.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getVertex_NorthingMetres(), ecorePackage.getEDouble(), "northingMetres", null, 0, 1, Vertex.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(samplingLocationEClass, SamplingLocation.class, "SamplingLocation", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getSamplingLocation_Name(), ecorePackage.getEString(), "name", null, 0, 1, SamplingLocation.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSamplingLocation_EastingMetres(), ecorePackage.getEDouble(), "eastingMetres", null, 0, 1, SamplingLocation.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSamplingLocation_NorthingMetres(), ecorePackage.getEDouble(), "northingMetres", null, 0, 1, SamplingLocation.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSamplingLocation_GroundElevationMetres(), ecorePackage.getEDouble(), "groundElevationMetres", null, 0, 1, SamplingLocation.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getSamplingLocation_Samples(), this.getSample(), null, "samples", null, 0, -1, SamplingLocation.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(sampleEClass, Sample.class, "Sample", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getSample_TopDepthMetres(), ecorePackage.getEDouble(), "topDepthMetres", null, 0, 1, Sample.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSample_BottomDepthMetres(), ecorePackage.getEDouble(), "bottomDepthMetres", null, 0, 1, Sample.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getSample_Contaminant(), this.getContaminant(), null, "contaminant", null, 1, 1, Sample.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_COMPOSITE, IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSample_ConcentrationMilligramsPerKg(), ecorePackage.getEDouble(), "concentrationMilligramsPerKg", null, 0, 1, Sample.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSample_NonDetect(), ecorePackage.getEBoolean(), "nonDetect", null, 0, 1, Sample.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSample_DetectionLimitMilligramsPerKg(), ecorePackage.getEDouble(), "detectionLimitMilligramsPerKg", null, 0, 1, Sample.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(excavationDesignEClass, ExcavationDesign.class, "ExcavationDesign", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getExcavationDesign_Name(), ecorePackage.getEString(), "name", null, 0, 1, ExcavationDesign.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getExcavationDesign_Zone(), this.getTreatmentZone(), null, "zone", null, 1, 1, ExcavationDesign.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_COMPOSITE, IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getExcavationDesign_SoilType(), this.getExcavationSoilType(), "soilType", null, 0, 1, ExcavationDesign.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getExcavationDesign_SideSlopeHorizontalPerVertical(), ecorePackage.getEDouble(), "sideSlopeHorizontalPerVertical", "1.5", 0, 1, ExcavationDesign.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getExcavationDesign_OverdigMetres(), ecorePackage.getEDouble(), "overdigMetres", null, 0, 1, ExcavationDesign.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getExcavationDesign_TruckHeapedCapacityCubicMetres(), ecorePackage.getEDouble(), "truckHeapedCapacityCubicMetres", "15", 0, 1, ExcavationDesign.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getExcavationDesign_TruckPayloadKilograms(), ecorePackage.getEDouble(), "truckPayloadKilograms", "20000", 0, 1, ExcavationDesign.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getExcavationDesign_PriceBook(), this.getPriceBook(), null, "priceBook", null, 0, 1, ExcavationDesign.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_COMPOSITE, IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(priceBookEClass, PriceBook.class, "PriceBook", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getPriceBook_Name(), ecorePackage.getEString(), "name", null, 0, 1, PriceBook.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPriceBook_Currency(), ecorePackage.getEString(), "currency", null, 0, 1, PriceBook.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPriceBook_Reference(), ecorePackage.getEString(), "reference", null, 0, 1, PriceBook.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getPriceBook_Items(), this.getPriceItem(), null, "items", null, 0, -1, PriceBook.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPriceBook_ScopeContingencyPercent(), ecorePackage.getEDouble(), "scopeContingencyPercent", "0.0", 0, 1, PriceBook.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPriceBook_BidContingencyPercent(), ecorePackage.getEDouble(), "bidContingencyPercent", "0.0", 0, 1, PriceBook.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPriceBook_ProjectManagementPercent(), ecorePackage.getEDouble(), "projectManagementPercent", "0.0", 0, 1, PriceBook.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPriceBook_RemedialDesignPercent(), ecorePackage.getEDouble(), "remedialDesignPercent", "0.0", 0, 1, PriceBook.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPriceBook_ConstructionManagementPercent(), ecorePackage.getEDouble(), "constructionManagementPercent", "0.0", 0, 1, PriceBook.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPriceBook_OperatingContingencyPercent(), ecorePackage.getEDouble(), "operatingContingencyPercent", "0.0", 0, 1, PriceBook.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPriceBook_OperatingProjectManagementPercent(), ecorePackage.getEDouble(), "operatingProjectManagementPercent", "0.0", 0, 1, PriceBook.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPriceBook_TechnicalSupportPercent(), ecorePackage.getEDouble(), "technicalSupportPercent", "0.0", 0, 1, PriceBook.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPriceBook_DiscountRatePercent(), ecorePackage.getEDouble(), "discountRatePercent", "7.0", 0, 1, PriceBook.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPriceBook_DiscountRateBasis(), ecorePackage.getEString(), "discountRateBasis", null, 0, 1, PriceBook.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(priceItemEClass, PriceItem.class, "PriceItem", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getPriceItem_Code(), ecorePackage.getEString(), "code", null, 0, 1, PriceItem.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPriceItem_Name(), ecorePackage.getEString(), "name", null, 0, 1, PriceItem.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPriceItem_Unit(), ecorePackage.getEString(), "unit", null, 0, 1, PriceItem.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPriceItem_RatePerUnit(), ecorePackage.getEDouble(), "ratePerUnit", null, 0, 1, PriceItem.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPriceItem_Currency(), ecorePackage.getEString(), "currency", null, 0, 1, PriceItem.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getPriceItem_SourceNote(), ecorePackage.getEString(), "sourceNote", null, 0, 1, PriceItem.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(columnTestEClass, ColumnTest.class, "ColumnTest", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getColumnTest_Name(), ecorePackage.getEString(), "name", null, 0, 1, ColumnTest.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getColumnTest_Contaminant(), this.getContaminant(), null, "contaminant", null, 1, 1, ColumnTest.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_COMPOSITE, IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getColumnTest_Layer(), this.getSoilLayer(), null, "layer", null, 0, 1, ColumnTest.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_COMPOSITE, IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getColumnTest_Kind(), this.getColumnTestKind(), "kind", null, 0, 1, ColumnTest.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getColumnTest_ColumnLengthMetres(), ecorePackage.getEDouble(), "columnLengthMetres", null, 0, 1, ColumnTest.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getColumnTest_DarcyFluxMetresPerDay(), ecorePackage.getEDouble(), "darcyFluxMetresPerDay", null, 0, 1, ColumnTest.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getColumnTest_WaterContent(), ecorePackage.getEDouble(), "waterContent", null, 0, 1, ColumnTest.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getColumnTest_BulkDensityKgPerCubicMetre(), ecorePackage.getEDouble(), "bulkDensityKgPerCubicMetre", null, 0, 1, ColumnTest.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getColumnTest_ReferenceConcentrationMilligramsPerLitre(), ecorePackage.getEDouble(), "referenceConcentrationMilligramsPerLitre", null, 0, 1, ColumnTest.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getColumnTest_Points(), this.getColumnTestPoint(), null, "points", null, 0, -1, ColumnTest.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(columnTestPointEClass, ColumnTestPoint.class, "ColumnTestPoint", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getColumnTestPoint_PoreVolumes(), ecorePackage.getEDouble(), "poreVolumes", null, 0, 1, ColumnTestPoint.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getColumnTestPoint_RelativeConcentration(), ecorePackage.getEDouble(), "relativeConcentration", null, 0, 1, ColumnTestPoint.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(uncertaintySettingsEClass, UncertaintySettings.class, "UncertaintySettings", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getUncertaintySettings_Enabled(), ecorePackage.getEBoolean(), "enabled", null, 0, 1, UncertaintySettings.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getUncertaintySettings_RunCount(), ecorePackage.getEInt(), "runCount", "2000", 0, 1, UncertaintySettings.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getUncertaintySettings_Seed(), ecorePackage.getELong(), "seed", "20261201", 0, 1, UncertaintySettings.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getUncertaintySettings_SamplingMethod(), this.getUncertaintySampling(), "samplingMethod", null, 0, 1, UncertaintySettings.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getUncertaintySettings_Inputs(), this.getUncertainInput(), null, "inputs", null, 0, -1, UncertaintySettings.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getUncertaintySettings_RankCorrelations(), this.getRankCorrelation(), null, "rankCorrelations", null, 0, -1, UncertaintySettings.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(uncertainInputEClass, UncertainInput.class, "UncertainInput", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getUncertainInput_Name(), ecorePackage.getEString(), "name", null, 0, 1, UncertainInput.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getUncertainInput_Target(), ecorePackage.getEObject(), null, "target", null, 0, 1, UncertainInput.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_COMPOSITE, IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getUncertainInput_FeatureName(), ecorePackage.getEString(), "featureName", null, 0, 1, UncertainInput.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getUncertainInput_Distribution(), this.getInputDistributionKind(), "distribution", null, 0, 1, UncertainInput.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getUncertainInput_MeanInFeatureUnit(), ecorePackage.getEDouble(), "meanInFeatureUnit", null, 0, 1, UncertainInput.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getUncertainInput_StandardDeviationInFeatureUnit(), ecorePackage.getEDouble(), "standardDeviationInFeatureUnit", null, 0, 1, UncertainInput.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getUncertainInput_MedianInFeatureUnit(), ecorePackage.getEDouble(), "medianInFeatureUnit", null, 0, 1, UncertainInput.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getUncertainInput_GeometricStandardDeviation(), ecorePackage.getEDouble(), "geometricStandardDeviation", "1", 0, 1, UncertainInput.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getUncertainInput_MinimumInFeatureUnit(), ecorePackage.getEDouble(), "minimumInFeatureUnit", null, 0, 1, UncertainInput.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getUncertainInput_ModeInFeatureUnit(), ecorePackage.getEDouble(), "modeInFeatureUnit", null, 0, 1, UncertainInput.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getUncertainInput_MaximumInFeatureUnit(), ecorePackage.getEDouble(), "maximumInFeatureUnit", null, 0, 1, UncertainInput.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(rankCorrelationEClass, RankCorrelation.class, "RankCorrelation", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEReference(getRankCorrelation_First(), this.getUncertainInput(), null, "first", null, 0, 1, RankCorrelation.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_COMPOSITE, IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getRankCorrelation_Second(), this.getUncertainInput(), null, "second", null, 0, 1, RankCorrelation.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_COMPOSITE, IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getRankCorrelation_Coefficient(), ecorePackage.getEDouble(), "coefficient", null, 0, 1, RankCorrelation.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(zoneAnalysisSettingsEClass, ZoneAnalysisSettings.class, "ZoneAnalysisSettings", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getZoneAnalysisSettings_Estimator(), this.getZoneEstimatorKind(), "estimator", null, 0, 1, ZoneAnalysisSettings.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getZoneAnalysisSettings_NonDetectRule(), this.getNonDetectValue(), "nonDetectRule", null, 0, 1, ZoneAnalysisSettings.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getZoneAnalysisSettings_InverseDistancePower(), ecorePackage.getEDouble(), "inverseDistancePower", "2.0", 0, 1, ZoneAnalysisSettings.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getZoneAnalysisSettings_MaximumNeighbours(), ecorePackage.getEInt(), "maximumNeighbours", "16", 0, 1, ZoneAnalysisSettings.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getZoneAnalysisSettings_SearchRadiusMetres(), ecorePackage.getEDouble(), "searchRadiusMetres", "0.0", 0, 1, ZoneAnalysisSettings.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getZoneAnalysisSettings_VerticalDistanceFactor(), ecorePackage.getEDouble(), "verticalDistanceFactor", "10.0", 0, 1, ZoneAnalysisSettings.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getZoneAnalysisSettings_BlockPlanSizeMetres(), ecorePackage.getEDouble(), "blockPlanSizeMetres", "0.0", 0, 1, ZoneAnalysisSettings.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getZoneAnalysisSettings_BlockDepthMetres(), ecorePackage.getEDouble(), "blockDepthMetres", "0.0", 0, 1, ZoneAnalysisSettings.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getZoneAnalysisSettings_VariogramModel(), this.getVariogramShapeKind(), "variogramModel", null, 0, 1, ZoneAnalysisSettings.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getZoneAnalysisSettings_VariogramNuggetMgPerKgSquared(), ecorePackage.getEDouble(), "variogramNuggetMgPerKgSquared", "0.0", 0, 1, ZoneAnalysisSettings.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getZoneAnalysisSettings_VariogramSillMgPerKgSquared(), ecorePackage.getEDouble(), "variogramSillMgPerKgSquared", "0.0", 0, 1, ZoneAnalysisSettings.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getZoneAnalysisSettings_VariogramRangeMetres(), ecorePackage.getEDouble(), "variogramRangeMetres", "0.0", 0, 1, ZoneAnalysisSettings.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getZoneAnalysisSettings_DelayYears(), ecorePackage.getEDouble(), "delayYears", null, 0, -1, ZoneAnalysisSettings.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, !IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getZoneAnalysisSettings_TransverseDispersivityFraction(), ecorePackage.getEDouble(), "transverseDispersivityFraction", "0.1", 0, 1, ZoneAnalysisSettings.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getZoneAnalysisSettings_HotSpotMultiple(), ecorePackage.getEDouble(), "hotSpotMultiple", "10.0", 0, 1, ZoneAnalysisSettings.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		// Initialize enums and add enum literals
		initEEnum(complianceCriterionEEnum, ComplianceCriterion.class, "ComplianceCriterion");
		addEEnumLiteral(complianceCriterionEEnum, ComplianceCriterion.EFFLUENT);
		addEEnumLiteral(complianceCriterionEEnum, ComplianceCriterion.MEAN_RESIDUAL);
		addEEnumLiteral(complianceCriterionEEnum, ComplianceCriterion.MAX_RESIDUAL);

		initEEnum(unitSystemEEnum, UnitSystem.class, "UnitSystem");
		addEEnumLiteral(unitSystemEEnum, UnitSystem.SI);
		addEEnumLiteral(unitSystemEEnum, UnitSystem.US_CUSTOMARY);

		initEEnum(dispersivityRuleEEnum, DispersivityRule.class, "DispersivityRule");
		addEEnumLiteral(dispersivityRuleEEnum, DispersivityRule.ENTERED);
		addEEnumLiteral(dispersivityRuleEEnum, DispersivityRule.TENTH_OF_SCALE);
		addEEnumLiteral(dispersivityRuleEEnum, DispersivityRule.XU_ECKSTEIN_1995);

		initEEnum(sorptionIsothermEEnum, SorptionIsotherm.class, "SorptionIsotherm");
		addEEnumLiteral(sorptionIsothermEEnum, SorptionIsotherm.LINEAR);
		addEEnumLiteral(sorptionIsothermEEnum, SorptionIsotherm.FREUNDLICH);
		addEEnumLiteral(sorptionIsothermEEnum, SorptionIsotherm.LANGMUIR);

		initEEnum(nonequilibriumEntryEEnum, NonequilibriumEntry.class, "NonequilibriumEntry");
		addEEnumLiteral(nonequilibriumEntryEEnum, NonequilibriumEntry.EQUILIBRIUM);
		addEEnumLiteral(nonequilibriumEntryEEnum, NonequilibriumEntry.DIMENSIONLESS);
		addEEnumLiteral(nonequilibriumEntryEEnum, NonequilibriumEntry.PHYSICAL);
		addEEnumLiteral(nonequilibriumEntryEEnum, NonequilibriumEntry.CHEMICAL);

		initEEnum(complianceStatisticEEnum, ComplianceStatistic.class, "ComplianceStatistic");
		addEEnumLiteral(complianceStatisticEEnum, ComplianceStatistic.NOT_TO_EXCEED);
		addEEnumLiteral(complianceStatisticEEnum, ComplianceStatistic.MEAN);
		addEEnumLiteral(complianceStatisticEEnum, ComplianceStatistic.UPPER_CONFIDENCE_LIMIT_95);

		initEEnum(solutionMethodEEnum, SolutionMethod.class, "SolutionMethod");
		addEEnumLiteral(solutionMethodEEnum, SolutionMethod.EQUILIBRIUM);
		addEEnumLiteral(solutionMethodEEnum, SolutionMethod.TWO_REGION);
		addEEnumLiteral(solutionMethodEEnum, SolutionMethod.NUMERICAL);

		initEEnum(excavationSoilTypeEEnum, ExcavationSoilType.class, "ExcavationSoilType");
		addEEnumLiteral(excavationSoilTypeEEnum, ExcavationSoilType.TYPE_C);
		addEEnumLiteral(excavationSoilTypeEEnum, ExcavationSoilType.TYPE_B);
		addEEnumLiteral(excavationSoilTypeEEnum, ExcavationSoilType.TYPE_A);
		addEEnumLiteral(excavationSoilTypeEEnum, ExcavationSoilType.STABLE_ROCK);

		initEEnum(columnTestKindEEnum, ColumnTestKind.class, "ColumnTestKind");
		addEEnumLiteral(columnTestKindEEnum, ColumnTestKind.BREAKTHROUGH);
		addEEnumLiteral(columnTestKindEEnum, ColumnTestKind.ELUTION);

		initEEnum(uncertaintySamplingEEnum, UncertaintySampling.class, "UncertaintySampling");
		addEEnumLiteral(uncertaintySamplingEEnum, UncertaintySampling.LATIN_HYPERCUBE);
		addEEnumLiteral(uncertaintySamplingEEnum, UncertaintySampling.PLAIN);

		initEEnum(inputDistributionKindEEnum, InputDistributionKind.class, "InputDistributionKind");
		addEEnumLiteral(inputDistributionKindEEnum, InputDistributionKind.NORMAL);
		addEEnumLiteral(inputDistributionKindEEnum, InputDistributionKind.LOGNORMAL);
		addEEnumLiteral(inputDistributionKindEEnum, InputDistributionKind.UNIFORM);
		addEEnumLiteral(inputDistributionKindEEnum, InputDistributionKind.TRIANGULAR);

		initEEnum(zoneEstimatorKindEEnum, ZoneEstimatorKind.class, "ZoneEstimatorKind");
		addEEnumLiteral(zoneEstimatorKindEEnum, ZoneEstimatorKind.INVERSE_DISTANCE);
		addEEnumLiteral(zoneEstimatorKindEEnum, ZoneEstimatorKind.ORDINARY_KRIGING);

		initEEnum(nonDetectValueEEnum, NonDetectValue.class, "NonDetectValue");
		addEEnumLiteral(nonDetectValueEEnum, NonDetectValue.HALF_DETECTION_LIMIT);
		addEEnumLiteral(nonDetectValueEEnum, NonDetectValue.DETECTION_LIMIT);
		addEEnumLiteral(nonDetectValueEEnum, NonDetectValue.ZERO);

		initEEnum(variogramShapeKindEEnum, VariogramShapeKind.class, "VariogramShapeKind");
		addEEnumLiteral(variogramShapeKindEEnum, VariogramShapeKind.SPHERICAL);
		addEEnumLiteral(variogramShapeKindEEnum, VariogramShapeKind.EXPONENTIAL);
		addEEnumLiteral(variogramShapeKindEEnum, VariogramShapeKind.GAUSSIAN);

		// Create resource
		createResource(eNS_URI);
	}

} //SitePackageImpl
