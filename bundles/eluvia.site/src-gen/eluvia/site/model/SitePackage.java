/**
 */
package eluvia.site.model;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EEnum;
import org.eclipse.emf.ecore.EPackage;
import org.eclipse.emf.ecore.EReference;

/**
 * <!-- begin-user-doc -->
 * The <b>Package</b> for the model.
 * It contains accessors for the meta objects to represent
 * <ul>
 *   <li>each class,</li>
 *   <li>each feature of each class,</li>
 *   <li>each operation of each class,</li>
 *   <li>each enum,</li>
 *   <li>and each data type</li>
 * </ul>
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * The Eluvia site model: the project file's content. Every quantity is stored in SI units (or the unit named in the feature name); conversion for display lives in eluvia.site.units.
 * <!-- end-model-doc -->
 * @see eluvia.site.model.SiteFactory
 * @model kind="package"
 * @generated
 */
public interface SitePackage extends EPackage {
	/**
	 * The package name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	String eNAME = "site";

	/**
	 * The package namespace URI.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	String eNS_URI = "urn:eluvia:site";

	/**
	 * The package namespace name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	String eNS_PREFIX = "site";

	/**
	 * The singleton instance of the package.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	SitePackage eINSTANCE = eluvia.site.model.impl.SitePackageImpl.init();

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.ProjectImpl <em>Project</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.ProjectImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getProject()
	 * @generated
	 */
	int PROJECT = 0;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__NAME = 0;

	/**
	 * The feature id for the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__DESCRIPTION = 1;

	/**
	 * The feature id for the '<em><b>Schema Version</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__SCHEMA_VERSION = 2;

	/**
	 * The feature id for the '<em><b>Site</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__SITE = 3;

	/**
	 * The feature id for the '<em><b>Contaminants</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__CONTAMINANTS = 4;

	/**
	 * The feature id for the '<em><b>Cleanup Levels</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__CLEANUP_LEVELS = 5;

	/**
	 * The feature id for the '<em><b>Flushing Designs</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT__FLUSHING_DESIGNS = 6;

	/**
	 * The number of structural features of the '<em>Project</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT_FEATURE_COUNT = 7;

	/**
	 * The number of operations of the '<em>Project</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PROJECT_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.SiteImpl <em>Site</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.SiteImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getSite()
	 * @generated
	 */
	int SITE = 1;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE__NAME = 0;

	/**
	 * The feature id for the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE__DESCRIPTION = 1;

	/**
	 * The feature id for the '<em><b>Layers</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE__LAYERS = 2;

	/**
	 * The feature id for the '<em><b>Zones</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE__ZONES = 3;

	/**
	 * The number of structural features of the '<em>Site</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE_FEATURE_COUNT = 4;

	/**
	 * The number of operations of the '<em>Site</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SITE_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.SoilLayerImpl <em>Soil Layer</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.SoilLayerImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getSoilLayer()
	 * @generated
	 */
	int SOIL_LAYER = 2;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__NAME = 0;

	/**
	 * The feature id for the '<em><b>Top Depth Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__TOP_DEPTH_METRES = 1;

	/**
	 * The feature id for the '<em><b>Bottom Depth Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__BOTTOM_DEPTH_METRES = 2;

	/**
	 * The feature id for the '<em><b>Texture Class</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__TEXTURE_CLASS = 3;

	/**
	 * The feature id for the '<em><b>Bulk Density Kg Per Cubic Metre</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__BULK_DENSITY_KG_PER_CUBIC_METRE = 4;

	/**
	 * The feature id for the '<em><b>Porosity</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__POROSITY = 5;

	/**
	 * The feature id for the '<em><b>Water Content</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__WATER_CONTENT = 6;

	/**
	 * The feature id for the '<em><b>Organic Carbon Fraction</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__ORGANIC_CARBON_FRACTION = 7;

	/**
	 * The feature id for the '<em><b>Saturated Conductivity Metres Per Day</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__SATURATED_CONDUCTIVITY_METRES_PER_DAY = 8;

	/**
	 * The feature id for the '<em><b>Dispersivity Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER__DISPERSIVITY_METRES = 9;

	/**
	 * The number of structural features of the '<em>Soil Layer</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER_FEATURE_COUNT = 10;

	/**
	 * The number of operations of the '<em>Soil Layer</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOIL_LAYER_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.ContaminantImpl <em>Contaminant</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.ContaminantImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getContaminant()
	 * @generated
	 */
	int CONTAMINANT = 3;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__NAME = 0;

	/**
	 * The feature id for the '<em><b>Cas Number</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__CAS_NUMBER = 1;

	/**
	 * The feature id for the '<em><b>Koc Litres Per Kg</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__KOC_LITRES_PER_KG = 2;

	/**
	 * The feature id for the '<em><b>Kd Entered</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__KD_ENTERED = 3;

	/**
	 * The feature id for the '<em><b>Kd Litres Per Kg</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__KD_LITRES_PER_KG = 4;

	/**
	 * The feature id for the '<em><b>Diffusion Square Metres Per Second</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__DIFFUSION_SQUARE_METRES_PER_SECOND = 5;

	/**
	 * The feature id for the '<em><b>Half Life Days</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT__HALF_LIFE_DAYS = 6;

	/**
	 * The number of structural features of the '<em>Contaminant</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT_FEATURE_COUNT = 7;

	/**
	 * The number of operations of the '<em>Contaminant</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTAMINANT_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.CleanupLevelImpl <em>Cleanup Level</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.CleanupLevelImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getCleanupLevel()
	 * @generated
	 */
	int CLEANUP_LEVEL = 4;

	/**
	 * The feature id for the '<em><b>Contaminant</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CLEANUP_LEVEL__CONTAMINANT = 0;

	/**
	 * The feature id for the '<em><b>Soil Level Milligrams Per Kg</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CLEANUP_LEVEL__SOIL_LEVEL_MILLIGRAMS_PER_KG = 1;

	/**
	 * The feature id for the '<em><b>Basis</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CLEANUP_LEVEL__BASIS = 2;

	/**
	 * The number of structural features of the '<em>Cleanup Level</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CLEANUP_LEVEL_FEATURE_COUNT = 3;

	/**
	 * The number of operations of the '<em>Cleanup Level</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CLEANUP_LEVEL_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.TreatmentZoneImpl <em>Treatment Zone</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.TreatmentZoneImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getTreatmentZone()
	 * @generated
	 */
	int TREATMENT_ZONE = 5;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TREATMENT_ZONE__NAME = 0;

	/**
	 * The feature id for the '<em><b>Area Square Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TREATMENT_ZONE__AREA_SQUARE_METRES = 1;

	/**
	 * The feature id for the '<em><b>Top Depth Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TREATMENT_ZONE__TOP_DEPTH_METRES = 2;

	/**
	 * The feature id for the '<em><b>Bottom Depth Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TREATMENT_ZONE__BOTTOM_DEPTH_METRES = 3;

	/**
	 * The feature id for the '<em><b>Source Concentrations</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TREATMENT_ZONE__SOURCE_CONCENTRATIONS = 4;

	/**
	 * The number of structural features of the '<em>Treatment Zone</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TREATMENT_ZONE_FEATURE_COUNT = 5;

	/**
	 * The number of operations of the '<em>Treatment Zone</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TREATMENT_ZONE_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.SourceConcentrationImpl <em>Source Concentration</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.SourceConcentrationImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getSourceConcentration()
	 * @generated
	 */
	int SOURCE_CONCENTRATION = 6;

	/**
	 * The feature id for the '<em><b>Contaminant</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOURCE_CONCENTRATION__CONTAMINANT = 0;

	/**
	 * The feature id for the '<em><b>Soil Concentration Milligrams Per Kg</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOURCE_CONCENTRATION__SOIL_CONCENTRATION_MILLIGRAMS_PER_KG = 1;

	/**
	 * The number of structural features of the '<em>Source Concentration</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOURCE_CONCENTRATION_FEATURE_COUNT = 2;

	/**
	 * The number of operations of the '<em>Source Concentration</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SOURCE_CONCENTRATION_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.impl.FlushingDesignImpl <em>Flushing Design</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.impl.FlushingDesignImpl
	 * @see eluvia.site.model.impl.SitePackageImpl#getFlushingDesign()
	 * @generated
	 */
	int FLUSHING_DESIGN = 7;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN__NAME = 0;

	/**
	 * The feature id for the '<em><b>Zone</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN__ZONE = 1;

	/**
	 * The feature id for the '<em><b>Darcy Flux Metres Per Day</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN__DARCY_FLUX_METRES_PER_DAY = 2;

	/**
	 * The feature id for the '<em><b>Operating Days Per Week</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN__OPERATING_DAYS_PER_WEEK = 3;

	/**
	 * The feature id for the '<em><b>Capture Efficiency</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN__CAPTURE_EFFICIENCY = 4;

	/**
	 * The feature id for the '<em><b>Criterion</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN__CRITERION = 5;

	/**
	 * The feature id for the '<em><b>Max Pore Volumes</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN__MAX_PORE_VOLUMES = 6;

	/**
	 * The number of structural features of the '<em>Flushing Design</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN_FEATURE_COUNT = 7;

	/**
	 * The number of operations of the '<em>Flushing Design</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FLUSHING_DESIGN_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link eluvia.site.model.ComplianceCriterion <em>Compliance Criterion</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see eluvia.site.model.ComplianceCriterion
	 * @see eluvia.site.model.impl.SitePackageImpl#getComplianceCriterion()
	 * @generated
	 */
	int COMPLIANCE_CRITERION = 8;


	/**
	 * Returns the meta object for class '{@link eluvia.site.model.Project <em>Project</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Project</em>'.
	 * @see eluvia.site.model.Project
	 * @generated
	 */
	EClass getProject();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Project#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see eluvia.site.model.Project#getName()
	 * @see #getProject()
	 * @generated
	 */
	EAttribute getProject_Name();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Project#getDescription <em>Description</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Description</em>'.
	 * @see eluvia.site.model.Project#getDescription()
	 * @see #getProject()
	 * @generated
	 */
	EAttribute getProject_Description();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Project#getSchemaVersion <em>Schema Version</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Schema Version</em>'.
	 * @see eluvia.site.model.Project#getSchemaVersion()
	 * @see #getProject()
	 * @generated
	 */
	EAttribute getProject_SchemaVersion();

	/**
	 * Returns the meta object for the containment reference '{@link eluvia.site.model.Project#getSite <em>Site</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference '<em>Site</em>'.
	 * @see eluvia.site.model.Project#getSite()
	 * @see #getProject()
	 * @generated
	 */
	EReference getProject_Site();

	/**
	 * Returns the meta object for the containment reference list '{@link eluvia.site.model.Project#getContaminants <em>Contaminants</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Contaminants</em>'.
	 * @see eluvia.site.model.Project#getContaminants()
	 * @see #getProject()
	 * @generated
	 */
	EReference getProject_Contaminants();

	/**
	 * Returns the meta object for the containment reference list '{@link eluvia.site.model.Project#getCleanupLevels <em>Cleanup Levels</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Cleanup Levels</em>'.
	 * @see eluvia.site.model.Project#getCleanupLevels()
	 * @see #getProject()
	 * @generated
	 */
	EReference getProject_CleanupLevels();

	/**
	 * Returns the meta object for the containment reference list '{@link eluvia.site.model.Project#getFlushingDesigns <em>Flushing Designs</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Flushing Designs</em>'.
	 * @see eluvia.site.model.Project#getFlushingDesigns()
	 * @see #getProject()
	 * @generated
	 */
	EReference getProject_FlushingDesigns();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.Site <em>Site</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Site</em>'.
	 * @see eluvia.site.model.Site
	 * @generated
	 */
	EClass getSite();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Site#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see eluvia.site.model.Site#getName()
	 * @see #getSite()
	 * @generated
	 */
	EAttribute getSite_Name();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Site#getDescription <em>Description</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Description</em>'.
	 * @see eluvia.site.model.Site#getDescription()
	 * @see #getSite()
	 * @generated
	 */
	EAttribute getSite_Description();

	/**
	 * Returns the meta object for the containment reference list '{@link eluvia.site.model.Site#getLayers <em>Layers</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Layers</em>'.
	 * @see eluvia.site.model.Site#getLayers()
	 * @see #getSite()
	 * @generated
	 */
	EReference getSite_Layers();

	/**
	 * Returns the meta object for the containment reference list '{@link eluvia.site.model.Site#getZones <em>Zones</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Zones</em>'.
	 * @see eluvia.site.model.Site#getZones()
	 * @see #getSite()
	 * @generated
	 */
	EReference getSite_Zones();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.SoilLayer <em>Soil Layer</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Soil Layer</em>'.
	 * @see eluvia.site.model.SoilLayer
	 * @generated
	 */
	EClass getSoilLayer();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see eluvia.site.model.SoilLayer#getName()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_Name();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getTopDepthMetres <em>Top Depth Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Top Depth Metres</em>'.
	 * @see eluvia.site.model.SoilLayer#getTopDepthMetres()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_TopDepthMetres();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getBottomDepthMetres <em>Bottom Depth Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Bottom Depth Metres</em>'.
	 * @see eluvia.site.model.SoilLayer#getBottomDepthMetres()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_BottomDepthMetres();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getTextureClass <em>Texture Class</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Texture Class</em>'.
	 * @see eluvia.site.model.SoilLayer#getTextureClass()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_TextureClass();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getBulkDensityKgPerCubicMetre <em>Bulk Density Kg Per Cubic Metre</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Bulk Density Kg Per Cubic Metre</em>'.
	 * @see eluvia.site.model.SoilLayer#getBulkDensityKgPerCubicMetre()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_BulkDensityKgPerCubicMetre();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getPorosity <em>Porosity</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Porosity</em>'.
	 * @see eluvia.site.model.SoilLayer#getPorosity()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_Porosity();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getWaterContent <em>Water Content</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Water Content</em>'.
	 * @see eluvia.site.model.SoilLayer#getWaterContent()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_WaterContent();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getOrganicCarbonFraction <em>Organic Carbon Fraction</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Organic Carbon Fraction</em>'.
	 * @see eluvia.site.model.SoilLayer#getOrganicCarbonFraction()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_OrganicCarbonFraction();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getSaturatedConductivityMetresPerDay <em>Saturated Conductivity Metres Per Day</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Saturated Conductivity Metres Per Day</em>'.
	 * @see eluvia.site.model.SoilLayer#getSaturatedConductivityMetresPerDay()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_SaturatedConductivityMetresPerDay();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SoilLayer#getDispersivityMetres <em>Dispersivity Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Dispersivity Metres</em>'.
	 * @see eluvia.site.model.SoilLayer#getDispersivityMetres()
	 * @see #getSoilLayer()
	 * @generated
	 */
	EAttribute getSoilLayer_DispersivityMetres();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.Contaminant <em>Contaminant</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Contaminant</em>'.
	 * @see eluvia.site.model.Contaminant
	 * @generated
	 */
	EClass getContaminant();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see eluvia.site.model.Contaminant#getName()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_Name();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getCasNumber <em>Cas Number</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Cas Number</em>'.
	 * @see eluvia.site.model.Contaminant#getCasNumber()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_CasNumber();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getKocLitresPerKg <em>Koc Litres Per Kg</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Koc Litres Per Kg</em>'.
	 * @see eluvia.site.model.Contaminant#getKocLitresPerKg()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_KocLitresPerKg();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#isKdEntered <em>Kd Entered</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Kd Entered</em>'.
	 * @see eluvia.site.model.Contaminant#isKdEntered()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_KdEntered();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getKdLitresPerKg <em>Kd Litres Per Kg</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Kd Litres Per Kg</em>'.
	 * @see eluvia.site.model.Contaminant#getKdLitresPerKg()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_KdLitresPerKg();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getDiffusionSquareMetresPerSecond <em>Diffusion Square Metres Per Second</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Diffusion Square Metres Per Second</em>'.
	 * @see eluvia.site.model.Contaminant#getDiffusionSquareMetresPerSecond()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_DiffusionSquareMetresPerSecond();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.Contaminant#getHalfLifeDays <em>Half Life Days</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Half Life Days</em>'.
	 * @see eluvia.site.model.Contaminant#getHalfLifeDays()
	 * @see #getContaminant()
	 * @generated
	 */
	EAttribute getContaminant_HalfLifeDays();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.CleanupLevel <em>Cleanup Level</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Cleanup Level</em>'.
	 * @see eluvia.site.model.CleanupLevel
	 * @generated
	 */
	EClass getCleanupLevel();

	/**
	 * Returns the meta object for the reference '{@link eluvia.site.model.CleanupLevel#getContaminant <em>Contaminant</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Contaminant</em>'.
	 * @see eluvia.site.model.CleanupLevel#getContaminant()
	 * @see #getCleanupLevel()
	 * @generated
	 */
	EReference getCleanupLevel_Contaminant();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.CleanupLevel#getSoilLevelMilligramsPerKg <em>Soil Level Milligrams Per Kg</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Soil Level Milligrams Per Kg</em>'.
	 * @see eluvia.site.model.CleanupLevel#getSoilLevelMilligramsPerKg()
	 * @see #getCleanupLevel()
	 * @generated
	 */
	EAttribute getCleanupLevel_SoilLevelMilligramsPerKg();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.CleanupLevel#getBasis <em>Basis</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Basis</em>'.
	 * @see eluvia.site.model.CleanupLevel#getBasis()
	 * @see #getCleanupLevel()
	 * @generated
	 */
	EAttribute getCleanupLevel_Basis();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.TreatmentZone <em>Treatment Zone</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Treatment Zone</em>'.
	 * @see eluvia.site.model.TreatmentZone
	 * @generated
	 */
	EClass getTreatmentZone();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.TreatmentZone#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see eluvia.site.model.TreatmentZone#getName()
	 * @see #getTreatmentZone()
	 * @generated
	 */
	EAttribute getTreatmentZone_Name();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.TreatmentZone#getAreaSquareMetres <em>Area Square Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Area Square Metres</em>'.
	 * @see eluvia.site.model.TreatmentZone#getAreaSquareMetres()
	 * @see #getTreatmentZone()
	 * @generated
	 */
	EAttribute getTreatmentZone_AreaSquareMetres();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.TreatmentZone#getTopDepthMetres <em>Top Depth Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Top Depth Metres</em>'.
	 * @see eluvia.site.model.TreatmentZone#getTopDepthMetres()
	 * @see #getTreatmentZone()
	 * @generated
	 */
	EAttribute getTreatmentZone_TopDepthMetres();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.TreatmentZone#getBottomDepthMetres <em>Bottom Depth Metres</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Bottom Depth Metres</em>'.
	 * @see eluvia.site.model.TreatmentZone#getBottomDepthMetres()
	 * @see #getTreatmentZone()
	 * @generated
	 */
	EAttribute getTreatmentZone_BottomDepthMetres();

	/**
	 * Returns the meta object for the containment reference list '{@link eluvia.site.model.TreatmentZone#getSourceConcentrations <em>Source Concentrations</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Source Concentrations</em>'.
	 * @see eluvia.site.model.TreatmentZone#getSourceConcentrations()
	 * @see #getTreatmentZone()
	 * @generated
	 */
	EReference getTreatmentZone_SourceConcentrations();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.SourceConcentration <em>Source Concentration</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Source Concentration</em>'.
	 * @see eluvia.site.model.SourceConcentration
	 * @generated
	 */
	EClass getSourceConcentration();

	/**
	 * Returns the meta object for the reference '{@link eluvia.site.model.SourceConcentration#getContaminant <em>Contaminant</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Contaminant</em>'.
	 * @see eluvia.site.model.SourceConcentration#getContaminant()
	 * @see #getSourceConcentration()
	 * @generated
	 */
	EReference getSourceConcentration_Contaminant();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.SourceConcentration#getSoilConcentrationMilligramsPerKg <em>Soil Concentration Milligrams Per Kg</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Soil Concentration Milligrams Per Kg</em>'.
	 * @see eluvia.site.model.SourceConcentration#getSoilConcentrationMilligramsPerKg()
	 * @see #getSourceConcentration()
	 * @generated
	 */
	EAttribute getSourceConcentration_SoilConcentrationMilligramsPerKg();

	/**
	 * Returns the meta object for class '{@link eluvia.site.model.FlushingDesign <em>Flushing Design</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Flushing Design</em>'.
	 * @see eluvia.site.model.FlushingDesign
	 * @generated
	 */
	EClass getFlushingDesign();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.FlushingDesign#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see eluvia.site.model.FlushingDesign#getName()
	 * @see #getFlushingDesign()
	 * @generated
	 */
	EAttribute getFlushingDesign_Name();

	/**
	 * Returns the meta object for the reference '{@link eluvia.site.model.FlushingDesign#getZone <em>Zone</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Zone</em>'.
	 * @see eluvia.site.model.FlushingDesign#getZone()
	 * @see #getFlushingDesign()
	 * @generated
	 */
	EReference getFlushingDesign_Zone();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.FlushingDesign#getDarcyFluxMetresPerDay <em>Darcy Flux Metres Per Day</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Darcy Flux Metres Per Day</em>'.
	 * @see eluvia.site.model.FlushingDesign#getDarcyFluxMetresPerDay()
	 * @see #getFlushingDesign()
	 * @generated
	 */
	EAttribute getFlushingDesign_DarcyFluxMetresPerDay();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.FlushingDesign#getOperatingDaysPerWeek <em>Operating Days Per Week</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Operating Days Per Week</em>'.
	 * @see eluvia.site.model.FlushingDesign#getOperatingDaysPerWeek()
	 * @see #getFlushingDesign()
	 * @generated
	 */
	EAttribute getFlushingDesign_OperatingDaysPerWeek();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.FlushingDesign#getCaptureEfficiency <em>Capture Efficiency</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Capture Efficiency</em>'.
	 * @see eluvia.site.model.FlushingDesign#getCaptureEfficiency()
	 * @see #getFlushingDesign()
	 * @generated
	 */
	EAttribute getFlushingDesign_CaptureEfficiency();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.FlushingDesign#getCriterion <em>Criterion</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Criterion</em>'.
	 * @see eluvia.site.model.FlushingDesign#getCriterion()
	 * @see #getFlushingDesign()
	 * @generated
	 */
	EAttribute getFlushingDesign_Criterion();

	/**
	 * Returns the meta object for the attribute '{@link eluvia.site.model.FlushingDesign#getMaxPoreVolumes <em>Max Pore Volumes</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Max Pore Volumes</em>'.
	 * @see eluvia.site.model.FlushingDesign#getMaxPoreVolumes()
	 * @see #getFlushingDesign()
	 * @generated
	 */
	EAttribute getFlushingDesign_MaxPoreVolumes();

	/**
	 * Returns the meta object for enum '{@link eluvia.site.model.ComplianceCriterion <em>Compliance Criterion</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Compliance Criterion</em>'.
	 * @see eluvia.site.model.ComplianceCriterion
	 * @generated
	 */
	EEnum getComplianceCriterion();

	/**
	 * Returns the factory that creates the instances of the model.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the factory that creates the instances of the model.
	 * @generated
	 */
	SiteFactory getSiteFactory();

	/**
	 * <!-- begin-user-doc -->
	 * Defines literals for the meta objects that represent
	 * <ul>
	 *   <li>each class,</li>
	 *   <li>each feature of each class,</li>
	 *   <li>each operation of each class,</li>
	 *   <li>each enum,</li>
	 *   <li>and each data type</li>
	 * </ul>
	 * <!-- end-user-doc -->
	 * @generated
	 */
	interface Literals {
		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.ProjectImpl <em>Project</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.ProjectImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getProject()
		 * @generated
		 */
		EClass PROJECT = eINSTANCE.getProject();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PROJECT__NAME = eINSTANCE.getProject_Name();

		/**
		 * The meta object literal for the '<em><b>Description</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PROJECT__DESCRIPTION = eINSTANCE.getProject_Description();

		/**
		 * The meta object literal for the '<em><b>Schema Version</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PROJECT__SCHEMA_VERSION = eINSTANCE.getProject_SchemaVersion();

		/**
		 * The meta object literal for the '<em><b>Site</b></em>' containment reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT__SITE = eINSTANCE.getProject_Site();

		/**
		 * The meta object literal for the '<em><b>Contaminants</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT__CONTAMINANTS = eINSTANCE.getProject_Contaminants();

		/**
		 * The meta object literal for the '<em><b>Cleanup Levels</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT__CLEANUP_LEVELS = eINSTANCE.getProject_CleanupLevels();

		/**
		 * The meta object literal for the '<em><b>Flushing Designs</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference PROJECT__FLUSHING_DESIGNS = eINSTANCE.getProject_FlushingDesigns();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.SiteImpl <em>Site</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.SiteImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getSite()
		 * @generated
		 */
		EClass SITE = eINSTANCE.getSite();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SITE__NAME = eINSTANCE.getSite_Name();

		/**
		 * The meta object literal for the '<em><b>Description</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SITE__DESCRIPTION = eINSTANCE.getSite_Description();

		/**
		 * The meta object literal for the '<em><b>Layers</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference SITE__LAYERS = eINSTANCE.getSite_Layers();

		/**
		 * The meta object literal for the '<em><b>Zones</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference SITE__ZONES = eINSTANCE.getSite_Zones();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.SoilLayerImpl <em>Soil Layer</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.SoilLayerImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getSoilLayer()
		 * @generated
		 */
		EClass SOIL_LAYER = eINSTANCE.getSoilLayer();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__NAME = eINSTANCE.getSoilLayer_Name();

		/**
		 * The meta object literal for the '<em><b>Top Depth Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__TOP_DEPTH_METRES = eINSTANCE.getSoilLayer_TopDepthMetres();

		/**
		 * The meta object literal for the '<em><b>Bottom Depth Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__BOTTOM_DEPTH_METRES = eINSTANCE.getSoilLayer_BottomDepthMetres();

		/**
		 * The meta object literal for the '<em><b>Texture Class</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__TEXTURE_CLASS = eINSTANCE.getSoilLayer_TextureClass();

		/**
		 * The meta object literal for the '<em><b>Bulk Density Kg Per Cubic Metre</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__BULK_DENSITY_KG_PER_CUBIC_METRE = eINSTANCE.getSoilLayer_BulkDensityKgPerCubicMetre();

		/**
		 * The meta object literal for the '<em><b>Porosity</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__POROSITY = eINSTANCE.getSoilLayer_Porosity();

		/**
		 * The meta object literal for the '<em><b>Water Content</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__WATER_CONTENT = eINSTANCE.getSoilLayer_WaterContent();

		/**
		 * The meta object literal for the '<em><b>Organic Carbon Fraction</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__ORGANIC_CARBON_FRACTION = eINSTANCE.getSoilLayer_OrganicCarbonFraction();

		/**
		 * The meta object literal for the '<em><b>Saturated Conductivity Metres Per Day</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__SATURATED_CONDUCTIVITY_METRES_PER_DAY = eINSTANCE.getSoilLayer_SaturatedConductivityMetresPerDay();

		/**
		 * The meta object literal for the '<em><b>Dispersivity Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOIL_LAYER__DISPERSIVITY_METRES = eINSTANCE.getSoilLayer_DispersivityMetres();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.ContaminantImpl <em>Contaminant</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.ContaminantImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getContaminant()
		 * @generated
		 */
		EClass CONTAMINANT = eINSTANCE.getContaminant();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__NAME = eINSTANCE.getContaminant_Name();

		/**
		 * The meta object literal for the '<em><b>Cas Number</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__CAS_NUMBER = eINSTANCE.getContaminant_CasNumber();

		/**
		 * The meta object literal for the '<em><b>Koc Litres Per Kg</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__KOC_LITRES_PER_KG = eINSTANCE.getContaminant_KocLitresPerKg();

		/**
		 * The meta object literal for the '<em><b>Kd Entered</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__KD_ENTERED = eINSTANCE.getContaminant_KdEntered();

		/**
		 * The meta object literal for the '<em><b>Kd Litres Per Kg</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__KD_LITRES_PER_KG = eINSTANCE.getContaminant_KdLitresPerKg();

		/**
		 * The meta object literal for the '<em><b>Diffusion Square Metres Per Second</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__DIFFUSION_SQUARE_METRES_PER_SECOND = eINSTANCE.getContaminant_DiffusionSquareMetresPerSecond();

		/**
		 * The meta object literal for the '<em><b>Half Life Days</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTAMINANT__HALF_LIFE_DAYS = eINSTANCE.getContaminant_HalfLifeDays();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.CleanupLevelImpl <em>Cleanup Level</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.CleanupLevelImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getCleanupLevel()
		 * @generated
		 */
		EClass CLEANUP_LEVEL = eINSTANCE.getCleanupLevel();

		/**
		 * The meta object literal for the '<em><b>Contaminant</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference CLEANUP_LEVEL__CONTAMINANT = eINSTANCE.getCleanupLevel_Contaminant();

		/**
		 * The meta object literal for the '<em><b>Soil Level Milligrams Per Kg</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CLEANUP_LEVEL__SOIL_LEVEL_MILLIGRAMS_PER_KG = eINSTANCE.getCleanupLevel_SoilLevelMilligramsPerKg();

		/**
		 * The meta object literal for the '<em><b>Basis</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CLEANUP_LEVEL__BASIS = eINSTANCE.getCleanupLevel_Basis();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.TreatmentZoneImpl <em>Treatment Zone</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.TreatmentZoneImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getTreatmentZone()
		 * @generated
		 */
		EClass TREATMENT_ZONE = eINSTANCE.getTreatmentZone();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TREATMENT_ZONE__NAME = eINSTANCE.getTreatmentZone_Name();

		/**
		 * The meta object literal for the '<em><b>Area Square Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TREATMENT_ZONE__AREA_SQUARE_METRES = eINSTANCE.getTreatmentZone_AreaSquareMetres();

		/**
		 * The meta object literal for the '<em><b>Top Depth Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TREATMENT_ZONE__TOP_DEPTH_METRES = eINSTANCE.getTreatmentZone_TopDepthMetres();

		/**
		 * The meta object literal for the '<em><b>Bottom Depth Metres</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TREATMENT_ZONE__BOTTOM_DEPTH_METRES = eINSTANCE.getTreatmentZone_BottomDepthMetres();

		/**
		 * The meta object literal for the '<em><b>Source Concentrations</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference TREATMENT_ZONE__SOURCE_CONCENTRATIONS = eINSTANCE.getTreatmentZone_SourceConcentrations();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.SourceConcentrationImpl <em>Source Concentration</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.SourceConcentrationImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getSourceConcentration()
		 * @generated
		 */
		EClass SOURCE_CONCENTRATION = eINSTANCE.getSourceConcentration();

		/**
		 * The meta object literal for the '<em><b>Contaminant</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference SOURCE_CONCENTRATION__CONTAMINANT = eINSTANCE.getSourceConcentration_Contaminant();

		/**
		 * The meta object literal for the '<em><b>Soil Concentration Milligrams Per Kg</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute SOURCE_CONCENTRATION__SOIL_CONCENTRATION_MILLIGRAMS_PER_KG = eINSTANCE.getSourceConcentration_SoilConcentrationMilligramsPerKg();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.impl.FlushingDesignImpl <em>Flushing Design</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.impl.FlushingDesignImpl
		 * @see eluvia.site.model.impl.SitePackageImpl#getFlushingDesign()
		 * @generated
		 */
		EClass FLUSHING_DESIGN = eINSTANCE.getFlushingDesign();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FLUSHING_DESIGN__NAME = eINSTANCE.getFlushingDesign_Name();

		/**
		 * The meta object literal for the '<em><b>Zone</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference FLUSHING_DESIGN__ZONE = eINSTANCE.getFlushingDesign_Zone();

		/**
		 * The meta object literal for the '<em><b>Darcy Flux Metres Per Day</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FLUSHING_DESIGN__DARCY_FLUX_METRES_PER_DAY = eINSTANCE.getFlushingDesign_DarcyFluxMetresPerDay();

		/**
		 * The meta object literal for the '<em><b>Operating Days Per Week</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FLUSHING_DESIGN__OPERATING_DAYS_PER_WEEK = eINSTANCE.getFlushingDesign_OperatingDaysPerWeek();

		/**
		 * The meta object literal for the '<em><b>Capture Efficiency</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FLUSHING_DESIGN__CAPTURE_EFFICIENCY = eINSTANCE.getFlushingDesign_CaptureEfficiency();

		/**
		 * The meta object literal for the '<em><b>Criterion</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FLUSHING_DESIGN__CRITERION = eINSTANCE.getFlushingDesign_Criterion();

		/**
		 * The meta object literal for the '<em><b>Max Pore Volumes</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FLUSHING_DESIGN__MAX_PORE_VOLUMES = eINSTANCE.getFlushingDesign_MaxPoreVolumes();

		/**
		 * The meta object literal for the '{@link eluvia.site.model.ComplianceCriterion <em>Compliance Criterion</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see eluvia.site.model.ComplianceCriterion
		 * @see eluvia.site.model.impl.SitePackageImpl#getComplianceCriterion()
		 * @generated
		 */
		EEnum COMPLIANCE_CRITERION = eINSTANCE.getComplianceCriterion();

	}

} //SitePackage
