import { Model, snakeCaseMappers } from 'objection';

// Every model maps snake_case columns to camelCase properties and keeps updatedAt current.
export class BaseModel extends Model {
  static get columnNameMappers() {
    return snakeCaseMappers();
  }

  updatedAt?: string;

  $beforeUpdate(): void {
    this.updatedAt = new Date().toISOString();
  }
}
