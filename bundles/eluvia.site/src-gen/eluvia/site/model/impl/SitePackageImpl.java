/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.CleanupLevel;
import eluvia.site.model.ComplianceCriterion;
import eluvia.site.model.Contaminant;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.Project;
import eluvia.site.model.Site;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SitePackage;
import eluvia.site.model.SoilLayer;
import eluvia.site.model.SourceConcentration;
import eluvia.site.model.TreatmentZone;

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
	private EEnum complianceCriterionEEnum = null;

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
	public EEnum getComplianceCriterion() {
		return complianceCriterionEEnum;
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

		siteEClass = createEClass(SITE);
		createEAttribute(siteEClass, SITE__NAME);
		createEAttribute(siteEClass, SITE__DESCRIPTION);
		createEReference(siteEClass, SITE__LAYERS);
		createEReference(siteEClass, SITE__ZONES);

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

		contaminantEClass = createEClass(CONTAMINANT);
		createEAttribute(contaminantEClass, CONTAMINANT__NAME);
		createEAttribute(contaminantEClass, CONTAMINANT__CAS_NUMBER);
		createEAttribute(contaminantEClass, CONTAMINANT__KOC_LITRES_PER_KG);
		createEAttribute(contaminantEClass, CONTAMINANT__KD_ENTERED);
		createEAttribute(contaminantEClass, CONTAMINANT__KD_LITRES_PER_KG);
		createEAttribute(contaminantEClass, CONTAMINANT__DIFFUSION_SQUARE_METRES_PER_SECOND);
		createEAttribute(contaminantEClass, CONTAMINANT__HALF_LIFE_DAYS);

		cleanupLevelEClass = createEClass(CLEANUP_LEVEL);
		createEReference(cleanupLevelEClass, CLEANUP_LEVEL__CONTAMINANT);
		createEAttribute(cleanupLevelEClass, CLEANUP_LEVEL__SOIL_LEVEL_MILLIGRAMS_PER_KG);
		createEAttribute(cleanupLevelEClass, CLEANUP_LEVEL__BASIS);

		treatmentZoneEClass = createEClass(TREATMENT_ZONE);
		createEAttribute(treatmentZoneEClass, TREATMENT_ZONE__NAME);
		createEAttribute(treatmentZoneEClass, TREATMENT_ZONE__AREA_SQUARE_METRES);
		createEAttribute(treatmentZoneEClass, TREATMENT_ZONE__TOP_DEPTH_METRES);
		createEAttribute(treatmentZoneEClass, TREATMENT_ZONE__BOTTOM_DEPTH_METRES);
		createEReference(treatmentZoneEClass, TREATMENT_ZONE__SOURCE_CONCENTRATIONS);

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

		// Create enums
		complianceCriterionEEnum = createEEnum(COMPLIANCE_CRITERION);
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

		initEClass(siteEClass, Site.class, "Site", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getSite_Name(), ecorePackage.getEString(), "name", null, 0, 1, Site.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getSite_Description(), ecorePackage.getEString(), "description", null, 0, 1, Site.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getSite_Layers(), this.getSoilLayer(), null, "layers", null, 0, -1, Site.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getSite_Zones(), this.getTreatmentZone(), null, "zones", null, 0, -1, Site.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

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

		initEClass(contaminantEClass, Contaminant.class, "Contaminant", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getContaminant_Name(), ecorePackage.getEString(), "name", null, 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_CasNumber(), ecorePackage.getEString(), "casNumber", null, 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_KocLitresPerKg(), ecorePackage.getEDouble(), "kocLitresPerKg", null, 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_KdEntered(), ecorePackage.getEBoolean(), "kdEntered", null, 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_KdLitresPerKg(), ecorePackage.getEDouble(), "kdLitresPerKg", null, 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_DiffusionSquareMetresPerSecond(), ecorePackage.getEDouble(), "diffusionSquareMetresPerSecond", "1.0E-9", 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getContaminant_HalfLifeDays(), ecorePackage.getEDouble(), "halfLifeDays", null, 0, 1, Contaminant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(cleanupLevelEClass, CleanupLevel.class, "CleanupLevel", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEReference(getCleanupLevel_Contaminant(), this.getContaminant(), null, "contaminant", null, 1, 1, CleanupLevel.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_COMPOSITE, IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getCleanupLevel_SoilLevelMilligramsPerKg(), ecorePackage.getEDouble(), "soilLevelMilligramsPerKg", null, 0, 1, CleanupLevel.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getCleanupLevel_Basis(), ecorePackage.getEString(), "basis", null, 0, 1, CleanupLevel.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(treatmentZoneEClass, TreatmentZone.class, "TreatmentZone", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getTreatmentZone_Name(), ecorePackage.getEString(), "name", null, 0, 1, TreatmentZone.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getTreatmentZone_AreaSquareMetres(), ecorePackage.getEDouble(), "areaSquareMetres", null, 0, 1, TreatmentZone.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getTreatmentZone_TopDepthMetres(), ecorePackage.getEDouble(), "topDepthMetres", null, 0, 1, TreatmentZone.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getTreatmentZone_BottomDepthMetres(), ecorePackage.getEDouble(), "bottomDepthMetres", null, 0, 1, TreatmentZone.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getTreatmentZone_SourceConcentrations(), this.getSourceConcentration(), null, "sourceConcentrations", null, 0, -1, TreatmentZone.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

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

		// Initialize enums and add enum literals
		initEEnum(complianceCriterionEEnum, ComplianceCriterion.class, "ComplianceCriterion");
		addEEnumLiteral(complianceCriterionEEnum, ComplianceCriterion.EFFLUENT);
		addEEnumLiteral(complianceCriterionEEnum, ComplianceCriterion.MEAN_RESIDUAL);
		addEEnumLiteral(complianceCriterionEEnum, ComplianceCriterion.MAX_RESIDUAL);

		// Create resource
		createResource(eNS_URI);
	}

} //SitePackageImpl
