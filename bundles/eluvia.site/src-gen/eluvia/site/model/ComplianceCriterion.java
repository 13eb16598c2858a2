/**
 */
package eluvia.site.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Compliance Criterion</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * The statistic a flushing design is held to.
 * <!-- end-model-doc -->
 * @see eluvia.site.model.SitePackage#getComplianceCriterion()
 * @model
 * @generated
 */
public enum ComplianceCriterion implements Enumerator {
	/**
	 * The '<em><b>EFFLUENT</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The effluent concentration leaving the treated layer.
	 * <!-- end-model-doc -->
	 * @see #EFFLUENT_VALUE
	 * @generated
	 * @ordered
	 */
	EFFLUENT(0, "EFFLUENT", "EFFLUENT"),

	/**
	 * The '<em><b>MEAN RESIDUAL</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The mean residual soil concentration in the layer.
	 * <!-- end-model-doc -->
	 * @see #MEAN_RESIDUAL_VALUE
	 * @generated
	 * @ordered
	 */
	MEAN_RESIDUAL(1, "MEAN_RESIDUAL", "MEAN_RESIDUAL"),

	/**
	 * The '<em><b>MAX RESIDUAL</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The maximum residual soil concentration anywhere in the layer (the strictest).
	 * <!-- end-model-doc -->
	 * @see #MAX_RESIDUAL_VALUE
	 * @generated
	 * @ordered
	 */
	MAX_RESIDUAL(2, "MAX_RESIDUAL", "MAX_RESIDUAL");

	/**
	 * The '<em><b>EFFLUENT</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The effluent concentration leaving the treated layer.
	 * <!-- end-model-doc -->
	 * @see #EFFLUENT
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int EFFLUENT_VALUE = 0;

	/**
	 * The '<em><b>MEAN RESIDUAL</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The mean residual soil concentration in the layer.
	 * <!-- end-model-doc -->
	 * @see #MEAN_RESIDUAL
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int MEAN_RESIDUAL_VALUE = 1;

	/**
	 * The '<em><b>MAX RESIDUAL</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The maximum residual soil concentration anywhere in the layer (the strictest).
	 * <!-- end-model-doc -->
	 * @see #MAX_RESIDUAL
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int MAX_RESIDUAL_VALUE = 2;

	/**
	 * An array of all the '<em><b>Compliance Criterion</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final ComplianceCriterion[] VALUES_ARRAY =
		new ComplianceCriterion[] {
			EFFLUENT,
			MEAN_RESIDUAL,
			MAX_RESIDUAL,
		};

	/**
	 * A public read-only list of all the '<em><b>Compliance Criterion</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<ComplianceCriterion> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Compliance Criterion</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static ComplianceCriterion get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			ComplianceCriterion result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Compliance Criterion</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static ComplianceCriterion getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			ComplianceCriterion result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Compliance Criterion</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static ComplianceCriterion get(int value) {
		switch (value) {
			case EFFLUENT_VALUE: return EFFLUENT;
			case MEAN_RESIDUAL_VALUE: return MEAN_RESIDUAL;
			case MAX_RESIDUAL_VALUE: return MAX_RESIDUAL;
		}
		return null;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private final int value;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private final String name;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private final String literal;

	/**
	 * Only this class can construct instances.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private ComplianceCriterion(int value, String name, String literal) {
		this.value = value;
		this.name = name;
		this.literal = literal;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getValue() {
	  return value;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getName() {
	  return name;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getLiteral() {
	  return literal;
	}

	/**
	 * Returns the literal value of the enumerator, which is its string representation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String toString() {
		return literal;
	}
	
} //ComplianceCriterion
