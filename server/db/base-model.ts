import { Model, snakeCaseMappers } from 'objection';

// Every model maps snake_case columns to camelCase properties and keeps updatedAt current.
export class BaseModel extends Model {
  static get columnNameMappers() {
    return snakeCaseMappers();
  }

  /** Tables without an updated_at column (append-only records) set this to false. */
  static hasUpdatedAt = true;

  updatedAt?: string;

  $beforeUpdate(): void {
    if ((this.constructor as typeof BaseModel).hasUpdatedAt) this.updatedAt = new Date().toISOString();
  }
}
